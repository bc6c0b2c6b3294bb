// Tangent sight line (two targets) and angle of sight: exact tangency, the parabola formula as the small-sag
// limit (REFERENCES 'Sighting methods', derived), and every input error by code.
import { describe, expect, it } from 'vitest';
import { spanAtTension, wireElevation } from '../../../core/catenary';
import { tensionFromSightAngle } from '../../../core/methods/sight-angle';
import { tensionFromSightLine } from '../../../core/methods/sight-line';
import { parabolicSightAngleSag, parabolicSightLineSag } from '../../../core/parabola';
import { solveSpan } from '../../../core/solve';
import { expectClose } from '../../helpers/expect-close';
import { expectCode } from '../../helpers/expect-code';
import { tangentAt } from './readings-from-curve';

const EXACT = 1e-9;

/** Smallest gap (wire minus sight line) over a fine grid of the span: ≥ 0 everywhere and ≈ 0 somewhere. */
function gapBelowWire(
  span: number,
  rise: number,
  weight: number,
  tension: number,
  nearDrop: number,
  farDrop: number,
) {
  const c = tension / weight;
  const lowX = spanAtTension({ span, rise }, weight, tension).lowPointX;
  let smallest = Infinity;
  for (let i = 0; i <= 20000; i++) {
    const x = (span * i) / 20000;
    const line = -nearDrop + ((rise - farDrop + nearDrop) * x) / span;
    smallest = Math.min(smallest, wireElevation(x, c, lowX) - line);
  }
  return smallest;
}

describe('sight-line', () => {
  it('equal targets on a level span: the sight is horizontal and touches at the low point, so D equals the drop exactly', () => {
    // Exact for the catenary too (symmetry), not only for the parabola.
    const solved = solveSpan({ span: 240, rise: 0 }, 9.1, {
      method: 'sight-line',
      nearDrop: 4.2,
      farDrop: 4.2,
    });
    expectClose(solved.midspanSag, 4.2, 1e-12);
  });

  it('the solved wire just touches the sight line: never below it, and within 1 mm of it at the touching point', () => {
    const span = 380;
    const rise = 95;
    const weight = 11.3;
    const tension = tensionFromSightLine({ span, rise }, weight, {
      method: 'sight-line',
      nearDrop: 2.1,
      farDrop: 14.7,
    });
    const gap = gapBelowWire(span, rise, weight, tension, 2.1, 14.7);
    // A 2 cm grid on a curve of radius ≈ C: the grid misses the exact touch by at most (1 cm)²/(2C) ≪ 1 mm.
    expect(gap).toBeGreaterThan(-1e-9);
    expect(gap).toBeLessThan(1e-3);
  });

  it('tends to the parabola D = ((√a + √b)/2)² on a level span: within 1e-5 at 0.5 % sag/span', () => {
    // REFERENCES 'Sighting methods' [derived]. On a level span the catenary departs from the parabola at
    // O((sag/span)²): 5e-6 relative at 0.5 % sag/span with the touch 30 % along the span.
    const known = { geometry: { span: 300, rise: 0 }, weight: 10, horizontalTension: 0 };
    known.horizontalTension = (10 * 300) / (8 * 0.005);
    const { nearDrop, farDrop } = tangentAt(known, 90);
    const solved = solveSpan(known.geometry, 10, { method: 'sight-line', nearDrop, farDrop });
    expectClose(solved.horizontalTension, known.horizontalTension, EXACT);
    expectClose(parabolicSightLineSag(nearDrop, farDrop), solved.midspanSag, 1e-5);
  });

  it('tends to the parabola formula on a span rising 50 %, with an error falling in proportion to the sag', () => {
    // On inclined spans the catenary's sag curve is lopsided at first order in sag/span, so the parabola formula
    // is off by O(sag/span) when the touch is off midspan (0.2 % at 1 % sag/span, touch 30 % along): halving the
    // sag must halve the error (ratio 2 within 5 %), which is what "small-sag limit" means here.
    const deviation = (sagRatio: number) => {
      const weight = 10;
      const known = {
        geometry: { span: 300, rise: 150 },
        weight,
        horizontalTension: (weight * 300) / (8 * sagRatio),
      };
      const { nearDrop, farDrop } = tangentAt(known, 90);
      const solved = solveSpan(known.geometry, weight, { method: 'sight-line', nearDrop, farDrop });
      expectClose(solved.horizontalTension, known.horizontalTension, EXACT);
      return parabolicSightLineSag(nearDrop, farDrop) / solved.midspanSag - 1;
    };
    const at1 = deviation(0.01);
    const atHalf = deviation(0.005);
    expect(Math.abs(at1)).toBeLessThan(0.0025);
    expectClose(at1 / atHalf, 2, 0.05);
  });

  it('rejects negative drops, a target level with an attachment and non-numbers, by code', () => {
    const g = { span: 200, rise: 20 };
    expectCode(
      () => tensionFromSightLine(g, 10, { method: 'sight-line', nearDrop: -1, farDrop: 3 }),
      'drop-negative',
    );
    expectCode(
      () => tensionFromSightLine(g, 10, { method: 'sight-line', nearDrop: 3, farDrop: -0.1 }),
      'drop-negative',
    );
    // A line through a support can only touch the wire at that support, never between the supports.
    expectCode(
      () => tensionFromSightLine(g, 10, { method: 'sight-line', nearDrop: 0, farDrop: 3 }),
      'sight-line-misses-wire',
    );
    expectCode(
      () => tensionFromSightLine(g, 10, { method: 'sight-line', nearDrop: 3, farDrop: 0 }),
      'sight-line-misses-wire',
    );
    expectCode(
      () => tensionFromSightLine(g, 10, { method: 'sight-line', nearDrop: Number.NaN, farDrop: 3 }),
      'input-not-finite',
    );
  });
});

describe('sight-angle', () => {
  it('recovers H from the instrument drop and the angle of the tangent on a falling span', () => {
    const weight = 7.9;
    const known = { geometry: { span: 520, rise: -160 }, weight, horizontalTension: 41000 };
    const { nearDrop, slope } = tangentAt(known, 0.64 * 520);
    const solved = tensionFromSightAngle(known.geometry, weight, {
      method: 'sight-angle',
      nearDrop,
      angle: Math.atan(slope),
    });
    expectClose(solved, 41000, EXACT);
  });

  it('agrees with the two-target sight when the far drop is b = a + h − S·tan θ (the parabolic relation tan θ = (h + a − b)/S)', () => {
    const g = { span: 260, rise: 35 };
    const angle = Math.atan((35 + 3 - 11) / 260);
    const byAngle = tensionFromSightAngle(g, 10, { method: 'sight-angle', nearDrop: 3, angle });
    const byTargets = tensionFromSightLine(g, 10, { method: 'sight-line', nearDrop: 3, farDrop: 11 });
    expectClose(byAngle, byTargets, EXACT);
    expectClose(parabolicSightAngleSag(260, 35, 3, angle), parabolicSightLineSag(3, 11), 1e-12);
  });

  it('rejects a sight over the far attachment, from the attachment itself, a vertical or non-number angle, by code', () => {
    const g = { span: 200, rise: 20 };
    // tan θ = 0.2 from 2 m below: passes 2 + 20 − 40 = −18 m, i.e. 18 m above the far attachment.
    expectCode(
      () => tensionFromSightAngle(g, 10, { method: 'sight-angle', nearDrop: 2, angle: Math.atan(0.2) }),
      'sight-line-misses-wire',
    );
    // Exactly through the far attachment: b = 0.
    expectCode(
      () => tensionFromSightAngle(g, 10, { method: 'sight-angle', nearDrop: 2, angle: Math.atan(0.11) }),
      'sight-line-misses-wire',
    );
    expectCode(
      () => tensionFromSightAngle(g, 10, { method: 'sight-angle', nearDrop: 0, angle: 0 }),
      'sight-line-misses-wire',
    );
    expectCode(
      () => tensionFromSightAngle(g, 10, { method: 'sight-angle', nearDrop: -2, angle: 0 }),
      'drop-negative',
    );
    expectCode(
      () => tensionFromSightAngle(g, 10, { method: 'sight-angle', nearDrop: 2, angle: Math.PI / 2 }),
      'angle-out-of-range',
    );
    expectCode(
      () => tensionFromSightAngle(g, 10, { method: 'sight-angle', nearDrop: 2, angle: -2 }),
      'angle-out-of-range',
    );
    expectCode(
      () => tensionFromSightAngle(g, 10, { method: 'sight-angle', nearDrop: 2, angle: Number.NaN }),
      'angle-not-finite',
    );
  });
});
