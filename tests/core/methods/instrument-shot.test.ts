// Instrument shots reduced to the span plane, against geometry worked by hand with 3-4-5 triangles.
import { describe, expect, it } from 'vitest';
import { shotToSpanPoint, type StationShot } from '../../../core/instrument-shot';
import { expectClose } from '../../helpers/expect-close';
import { expectCode } from '../../helpers/expect-code';

const shot: StationShot = {
  stationX: 10,
  stationOffset: 24,
  stationElevation: -2,
  instrumentHeight: 1.6,
  slopeDistance: 50,
  // sin = 0.6, cos = 0.8: 30 m up, 40 m across.
  verticalAngle: Math.atan2(3, 4),
  // 40 m across at cos = 0.8, sin = −0.6 (turned right of the span direction): 32 m along, 24 m to the right.
  horizontalAngle: Math.atan2(-3, 4),
};

describe('shotToSpanPoint', () => {
  it('puts a shot from a station 24 m left of the line, turned right, onto the line (hand-worked 3-4-5 geometry)', () => {
    const point = shotToSpanPoint(shot);
    expectClose(point.x, 10 + 32, 1e-14);
    expectClose(point.z, -2 + 1.6 + 30, 1e-14);
    expect(Math.abs(point.offset)).toBeLessThan(1e-12);
  });

  it('reports how far off the span plane a shot lands (for a warning)', () => {
    const point = shotToSpanPoint({ ...shot, horizontalAngle: 0 });
    expectClose(point.x, 50, 1e-14);
    expectClose(point.offset, 24, 1e-14);
  });

  it('handles a downward sight from a station beyond the far support looking back (angle π)', () => {
    const point = shotToSpanPoint({
      ...shot,
      stationX: 320,
      stationOffset: 0,
      horizontalAngle: Math.PI,
      verticalAngle: -Math.atan2(3, 4),
    });
    expectClose(point.x, 320 - 40, 1e-14);
    expectClose(point.z, -2 + 1.6 - 30, 1e-14);
  });

  it('rejects a non-positive distance, a vertical angle past ±90° and non-numbers, by code', () => {
    expectCode(() => shotToSpanPoint({ ...shot, slopeDistance: 0 }), 'distance-not-positive');
    expectCode(() => shotToSpanPoint({ ...shot, verticalAngle: 1.6 }), 'angle-out-of-range');
    expectCode(() => shotToSpanPoint({ ...shot, horizontalAngle: Number.NaN }), 'input-not-finite');
  });
});
