import { describe, it, expect } from 'vitest';
import { sectionSpread, tensionSpread } from '../../../core';
import { expectClose } from '../../helpers/expect-close';

describe('section tension spread', () => {
  const entries = [
    { id: 'span-1', horizontalTension: 28000 },
    { id: 'span-2', horizontalTension: 28250 },
    { id: 'span-3', horizontalTension: 27750 },
    { id: 'span-4', horizontalTension: 28125 },
    { id: 'span-5', horizontalTension: 27875 },
    { id: 'span-6', horizontalTension: 35500 },
  ];

  it('points out the span whose tension stands apart (modified z-score > 3.5)', () => {
    // Hand computation: median 28062.5 N, absolute deviations 62.5, 187.5, 312.5, 62.5, 187.5, 7437.5 →
    // MAD 187.5 N; span 6: 0.6745·7437.5/187.5 = 26.75 > 3.5 (Iglewicz & Hoaglin threshold, from memory).
    const spread = tensionSpread(entries);
    expectClose(spread.median, 28062.5, 1e-12);
    expect(spread.outliers).toEqual(['span-6']);
    expectClose(spread.entries[5]?.modifiedZ ?? Number.NaN, (0.6744897501960817 * 7437.5) / 187.5, 1e-9);
    expectClose(spread.relativeSpread, (35500 - 27750) / 28062.5, 1e-12);
  });

  it('names no outlier in a section whose spans agree', () => {
    expect(tensionSpread(entries.slice(0, 5)).outliers).toEqual([]);
  });

  it('compares each wire position only with itself', () => {
    // Phase A a little higher than phase B throughout: no outlier within either group.
    const grouped = entries.slice(0, 5).flatMap((e) => [
      { ...e, id: `${e.id}-A`, group: 'A', horizontalTension: e.horizontalTension + 2000 },
      { ...e, id: `${e.id}-B`, group: 'B' },
    ]);
    const spreads = sectionSpread(grouped);
    expect(spreads.map((s) => s.group).sort()).toEqual(['A', 'B']);
    expect(spreads.every((s) => s.outliers.length === 0)).toBe(true);
  });
});
