import { describe, expect, it } from 'vitest';
import { handlingAdvice, teamCapacitiesKg } from '../../../../shared/planner/engineering/handling';

describe('teamCapacitiesKg', () => {
  it('gives two people at 25 kg each a team capacity of 33.3 kg and three 37.5 kg', () => {
    const c = teamCapacitiesKg();
    expect(c.one).toBe(25); // published: HSE manual handling guideline (UK, L23 / INDG143)
    expect(c.two).toBeCloseTo(33.3, 1); // published worked example: two people at 25 kg each → 33.3 kg
    expect(c.three).toBe(37.5); // published: team lifting (HSE), three people — half the sum
  });

  it('scales with the lifters’ own guideline', () => {
    expect(teamCapacitiesKg(16).two).toBeCloseTo((2 / 3) * 32, 12); // published: HSE, 16 kg (women); two-thirds of the sum
  });
});

describe('handlingAdvice', () => {
  it.each([
    [10, 'one-person'],
    [25, 'one-person'],
    [25.1, 'two-person'],
    [33.3, 'two-person'],
    [33.4, 'three-person'],
    [37.5, 'three-person'],
    [37.6, 'mechanical-or-dismantle'],
  ])('advises a %s kg board be lifted by %s', (massKg, liftBy) => {
    expect(handlingAdvice(massKg).liftBy).toBe(liftBy); // published: HSE manual handling guideline and team lifting
  });

  it('explains in plain words, with the figures it used', () => {
    expect(handlingAdvice(30).explanation).toBe(
      'At 30.0 kg this board is over the 25.0 kg guideline for one person; two people can lift up to 33.3 kg ' +
        'together (two-thirds of their combined 50.0 kg).',
    );
    expect(handlingAdvice(40).explanation).toMatch(/more than 4 seldom work.*take the board apart/);
  });

  it('always says these are guidelines and to follow local rules', () => {
    for (const mass of [5, 30, 36, 60]) {
      const { caution } = handlingAdvice(mass);
      expect(caution).toMatch(/guidelines, not safe limits/);
      expect(caution).toMatch(/Follow your local rules/);
    }
  });

  it('uses a lower capacity for lifters whose guideline is lower', () => {
    expect(handlingAdvice(20, { personCapacityKg: 16 }).liftBy).toBe('two-person'); // published: HSE, 16 kg (women)
  });

  it('refuses a negative mass', () => {
    expect(() => handlingAdvice(-1)).toThrow(/Board mass/);
  });
});
