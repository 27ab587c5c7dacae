import { describe, expect, it } from 'vitest';
import { componentsFindIndistinguishable, MIN_DISTINCT_LINES } from '../../../matching/analyse/componentsFindIndistinguishable';

const row = (entryId: string, amountPerNucleus: number, distinctLines: number | undefined, resolvedLines = 9) => ({ entryId, amountPerNucleus, resolvedLines, distinctLines });

describe('componentsFindIndistinguishable', () => {
  it('returns nothing without related lists, or when only one member of a list was fitted', () => {
    expect(componentsFindIndistinguishable([], [])).toEqual([]);
    expect(componentsFindIndistinguishable([row('a', 1, 0)], [['a', 'b']])).toEqual([]);
    expect(componentsFindIndistinguishable([row('a', 1, 0), row('b', 1, 0)], [])).toEqual([]);
  });

  it('needs two resolved lines of its own per member (one line fits any look-alike)', () => {
    expect(MIN_DISTINCT_LINES).toBe(2);
    expect(componentsFindIndistinguishable([row('a', 2, 2), row('b', 1, 2)], [['a', 'b']])).toEqual([{ members: ['a', 'b'], identifiable: true, lacking: [] }]);
    expect(componentsFindIndistinguishable([row('a', 2, 5), row('b', 1, 1)], [['b', 'a']])).toEqual([{ members: ['a', 'b'], identifiable: false, lacking: ['b'] }]);
  });

  it('falls back to resolvedLines when a bare fit has no distinctLines', () => {
    expect(componentsFindIndistinguishable([row('a', 2, undefined, 1), row('b', 3, undefined, 4)], [['a', 'b']])[0]).toEqual({ members: ['b', 'a'], identifiable: false, lacking: ['a'] });
  });

  it('joins lists that share a member, and orders sets and members by amount', () => {
    const comps = [row('a', 1, 3), row('b', 5, 0), row('c', 2, 3), row('x', 9, 3), row('y', 8, 3)];
    const sets = componentsFindIndistinguishable(comps, [['a', 'b'], ['c', 'a', 'zz'], ['x', 'y'], ['a', 'a']]);
    expect(sets).toEqual([
      { members: ['x', 'y'], identifiable: true, lacking: [] },
      { members: ['b', 'c', 'a'], identifiable: false, lacking: ['b'] },
    ]);
  });
});
