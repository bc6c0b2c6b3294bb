// solveSpan: the dispatcher of SPEC §4, its exports, and the errors every method shares.
import { describe, expect, it } from 'vitest';
import * as core from '../../core';
import { spanAtTension } from '../../core/catenary';
import { solveSpan } from '../../core/solve';
import type { Measurement } from '../../core/types';
import { expectClose } from '../helpers/expect-close';
import { expectCode } from '../helpers/expect-code';

const readings: Measurement[] = [
  { method: 'midspan-sag', sag: 4 },
  { method: 'offset-sag', x: 60, sag: 3 },
  { method: 'sight-line', nearDrop: 3, farDrop: 5 },
  { method: 'sight-angle', nearDrop: 3, angle: 0.05 },
  { method: 'return-wave', returns: 3, seconds: 8 },
  {
    method: 'surveyed-points',
    points: [
      { x: 20, z: -1.5 },
      { x: 100, z: -2.5 },
      { x: 180, z: 6 },
    ],
  },
];

describe('solveSpan', () => {
  it('is exported from core/index with spanAtTension and SpanInputError under the SPEC §4 names', () => {
    expect(core.solveSpan).toBe(solveSpan);
    expect(core.spanAtTension).toBe(spanAtTension);
    expect(typeof core.SpanInputError).toBe('function');
  });

  it('returns the whole span at the solved tension, identical to spanAtTension there, for every method', () => {
    const g = { span: 200, rise: 15 };
    for (const m of readings) {
      const solved = solveSpan(g, 10, m);
      const forward = spanAtTension(g, 10, solved.horizontalTension);
      for (const key of Object.keys(forward) as (keyof typeof forward)[]) {
        expectClose(solved[key]!, forward[key]!, 1e-15, `${m.method} ${key}`);
      }
    }
  });

  it('the midspan sag of the solved span equals the reading (to 1e-12)', () => {
    expectClose(
      solveSpan({ span: 200, rise: 15 }, 10, { method: 'midspan-sag', sag: 4 }).midspanSag,
      4,
      1e-12,
    );
  });

  it('rejects an unknown method, a bad span, rise or weight for every method, by code', () => {
    expectCode(
      () =>
        solveSpan({ span: 200, rise: 0 }, 10, { method: 'dynamometer', pull: 3 } as unknown as Measurement),
      'unknown-method',
    );
    for (const m of readings) {
      expectCode(() => solveSpan({ span: 0, rise: 0 }, 10, m), 'span-not-positive');
      expectCode(() => solveSpan({ span: Number.NaN, rise: 0 }, 10, m), 'span-not-positive');
      expectCode(() => solveSpan({ span: 200, rise: Number.POSITIVE_INFINITY }, 10, m), 'rise-not-finite');
      expectCode(() => solveSpan({ span: 200, rise: 0 }, 0, m), 'weight-not-positive');
      expectCode(() => solveSpan({ span: 200, rise: 0 }, -3, m), 'weight-not-positive');
    }
  });
});
