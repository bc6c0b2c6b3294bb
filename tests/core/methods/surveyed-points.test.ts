// Least-squares catenary through surveyed points: exact recovery, optimality with noise, invariances, errors.
import { describe, expect, it } from 'vitest';
import { spanAtTension, wireElevation } from '../../../core/catenary';
import { fitCatenaryToPoints, tensionFromSurveyedPoints } from '../../../core/methods/surveyed-points';
import { solveSpan } from '../../../core/solve';
import { expectClose } from '../../helpers/expect-close';
import { expectCode } from '../../helpers/expect-code';

const EXACT = 1e-9;

function pointsOn(span: number, rise: number, c: number, xs: number[]) {
  const lowX = spanAtTension({ span, rise }, 1, c).lowPointX;
  return xs.map((x) => ({ x, z: wireElevation(x, c, lowX) }));
}

/** RMS vertical distance from points to z = z_m + C·(cosh((x − x_m)/C) − 1): SPEC §2's curve, written out. */
function rmsAbout(points: { x: number; z: number }[], c: number, lowX: number, lowZ: number) {
  let sum = 0;
  for (const p of points) sum += (p.z - lowZ - c * (Math.cosh((p.x - lowX) / c) - 1)) ** 2;
  return Math.sqrt(sum / points.length);
}

describe('surveyed-points', () => {
  it('passes exactly through three points and recovers C, the low point and H', () => {
    const points = pointsOn(300, 60, 1800, [40, 150, 260]);
    const fit = tensionFromSurveyedPoints({ span: 300, rise: 60 }, 12, { method: 'surveyed-points', points });
    expectClose(fit.catenaryParameter, 1800, EXACT);
    expectClose(fit.horizontalTension, 12 * 1800, EXACT);
    expectClose(fit.lowPointX, spanAtTension({ span: 300, rise: 60 }, 1, 1800).lowPointX, EXACT);
    expect(fit.fitResidual).toBeLessThan(1e-9);
  });

  it('reports the RMS residual of noisy shots, and that fit is a least-squares minimum', () => {
    // Seven shots with ±2–3 cm errors on a 400 m span (C = 1500 m).
    const noise = [0.021, -0.03, 0.012, -0.025, 0.028, -0.009, 0.018];
    const clean = pointsOn(400, -80, 1500, [20, 75, 130, 190, 250, 310, 375]);
    const points = clean.map((p, i) => ({ x: p.x, z: p.z + noise[i]! }));
    const fit = fitCatenaryToPoints(points);
    // The reported residual is the RMS about the reported curve (checked with the curve written out here).
    expectClose(fit.fitResidual, rmsAbout(points, fit.catenaryParameter, fit.lowPointX, fit.lowPointZ), 1e-9);
    expect(fit.fitResidual).toBeGreaterThan(0.005);
    expect(fit.fitResidual).toBeLessThan(0.03);
    // Centimetre noise moves C by well under 1 % here.
    expectClose(fit.catenaryParameter, 1500, 0.01);
    // Least squares: any small change of the three free parameters raises the RMS.
    const base = fit.fitResidual;
    for (const [dc, dx, dz] of [
      [1, 0, 0],
      [-1, 0, 0],
      [0, 0.5, 0],
      [0, -0.5, 0],
      [0, 0, 0.003],
      [0, 0, -0.003],
    ] as const) {
      expect(
        rmsAbout(points, fit.catenaryParameter + dc, fit.lowPointX + dx, fit.lowPointZ + dz),
      ).toBeGreaterThan(base);
    }
  });

  it('gives the same C when every z is raised and every x is shifted (offset and low point are free)', () => {
    const points = pointsOn(250, 20, 900, [10, 70, 120, 180, 240]);
    const moved = points.map((p) => ({ x: p.x + 33.3, z: p.z - 7.25 }));
    expectClose(fitCatenaryToPoints(moved).catenaryParameter, 900, EXACT);
    expectClose(fitCatenaryToPoints(moved).lowPointX, fitCatenaryToPoints(points).lowPointX + 33.3, EXACT);
  });

  it('solveSpan returns the span at the fitted tension plus fitResidual, other methods none', () => {
    const points = pointsOn(300, 60, 1800, [30, 100, 160, 220, 280]);
    const solved = solveSpan({ span: 300, rise: 60 }, 12, { method: 'surveyed-points', points });
    expectClose(solved.horizontalTension, 12 * 1800, EXACT);
    expect(solved.fitResidual).toBeLessThan(1e-9);
    expect(
      solveSpan({ span: 300, rise: 60 }, 12, { method: 'midspan-sag', sag: 5 }).fitResidual,
    ).toBeUndefined();
  });

  it('rejects too few, non-number, stacked, straight and upward-bulging points, by code', () => {
    const g = { span: 100, rise: 0 };
    const fit = (points: { x: number; z: number }[]) => () =>
      tensionFromSurveyedPoints(g, 10, { method: 'surveyed-points', points });
    expectCode(
      fit([
        { x: 10, z: -1 },
        { x: 50, z: -2 },
      ]),
      'points-too-few',
    );
    expectCode(
      fit([
        { x: 10, z: -1 },
        { x: 50, z: Number.NaN },
        { x: 90, z: -1 },
      ]),
      'points-not-finite',
    );
    expectCode(
      fit([
        { x: 10, z: -1 },
        { x: Number.POSITIVE_INFINITY, z: -2 },
        { x: 90, z: -1 },
      ]),
      'points-not-finite',
    );
    // All at one distance: a vertical line of shots says nothing about the curve.
    expectCode(
      fit([
        { x: 50, z: -1 },
        { x: 50, z: -2 },
        { x: 50, z: -3 },
      ]),
      'points-degenerate',
    );
    // Only two distinct distances.
    expectCode(
      fit([
        { x: 20, z: -1 },
        { x: 20, z: -1.1 },
        { x: 70, z: -2 },
      ]),
      'points-degenerate',
    );
    // Collinear: no sag at all.
    expectCode(
      fit([
        { x: 10, z: 1 },
        { x: 40, z: 4 },
        { x: 70, z: 7 },
        { x: 95, z: 9.5 },
      ]),
      'points-degenerate',
    );
    // Bulging upward: a hanging wire cannot do that.
    expectCode(
      fit([
        { x: 10, z: -1 },
        { x: 50, z: 1 },
        { x: 90, z: -1 },
      ]),
      'points-degenerate',
    );
  });
});
