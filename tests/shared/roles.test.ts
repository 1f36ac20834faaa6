import { describe, expect, it } from 'vitest';
import { hasAnyRole, roleSatisfies } from '../../shared/roles';

describe('roleSatisfies', () => {
  it('lets every account do what a member may', () => {
    for (const role of ['member', 'builder', 'moderator', 'admin'] as const)
      expect(roleSatisfies(role, 'member')).toBe(true);
  });

  it('lets an administrator do what a moderator may, but not the reverse', () => {
    expect(roleSatisfies('admin', 'moderator')).toBe(true);
    expect(roleSatisfies('moderator', 'admin')).toBe(false);
  });

  it('keeps builder rights to builders', () => {
    expect(roleSatisfies('admin', 'builder')).toBe(false);
    expect(roleSatisfies('member', 'builder')).toBe(false);
    expect(hasAnyRole('builder', ['builder', 'moderator'])).toBe(true);
  });
});
