import { describe, expect, it } from 'vitest';
import { CREW_ROLES, roleAtLeast, WRITER_ROLES } from './roles.js';
import { FIND_KINDS, FIND_SUB_KINDS } from './taxonomy.js';

describe('roleAtLeast', () => {
  it('orders owner above angler above viewer', () => {
    expect(roleAtLeast('owner', 'angler')).toBe(true);
    expect(roleAtLeast('angler', 'angler')).toBe(true);
    expect(roleAtLeast('angler', 'owner')).toBe(false);
    expect(roleAtLeast('viewer', 'angler')).toBe(false);
    expect(roleAtLeast('viewer', 'viewer')).toBe(true);
  });

  it('lets exactly the writer roles write', () => {
    const writers = CREW_ROLES.filter((r) => roleAtLeast(r, 'angler'));
    expect(writers).toEqual([...WRITER_ROLES]);
  });
});

describe('taxonomy', () => {
  it('gives every kind of find at least one sub-kind, with no sub-kind repeated across kinds', () => {
    const all = FIND_KINDS.flatMap((k) => FIND_SUB_KINDS[k]);
    for (const k of FIND_KINDS) expect(FIND_SUB_KINDS[k].length).toBeGreaterThan(0);
    expect(new Set(all).size).toBe(all.length);
  });
});
