import { describe, expect, it } from 'vitest';
import {
  CAUTIONS,
  cautionsFor,
  FOLLOW_LOCAL_RULES,
  type WorkActivity,
} from '../../../../shared/planner/engineering/safety';

const ACTIVITIES: WorkActivity[] = ['cutting', 'drilling', 'sanding', 'lifting', 'wiring', 'fixing-to-wall'];

describe('cautionsFor', () => {
  it('warns that mains wiring is for a qualified person and the layout needs an approved low-voltage supply', () => {
    const wiring = cautionsFor(['wiring']); // common practice, no source
    expect(wiring).toEqual([
      expect.stringMatching(/qualified person/),
      expect.stringMatching(/low voltage from a proper, approved supply/),
      FOLLOW_LOCAL_RULES,
    ]);
  });

  it('covers guards, eye and ear protection, dust, clamping and clothing when cutting', () => {
    const text = cautionsFor(['cutting']).join(' ');
    for (const word of [/guards/, /eye protection/, /ear protection/, /dust mask/, /Clamp/, /loose clothing/]) {
      expect(text).toMatch(word);
    }
  });

  it('ends every list with the reminder to follow local rules and the tool maker', () => {
    expect(cautionsFor([])).toEqual([FOLLOW_LOCAL_RULES]);
    expect(FOLLOW_LOCAL_RULES).toMatch(/local rules and each tool maker's instructions/);
  });

  it('has a caution for every kind of work, each said once', () => {
    for (const activity of ACTIVITIES) expect(CAUTIONS.some((c) => c.appliesTo.includes(activity))).toBe(true);
    const all = cautionsFor(ACTIVITIES);
    expect(new Set(all).size).toBe(all.length);
    expect(all).toHaveLength(CAUTIONS.length + 1);
  });
});
