import { describe, it, expect } from 'vitest';
import {
  assessReading,
  assessSection,
  assessWire,
  designAtTemperature,
  SpanInputError,
  spanAtTension,
  resolveUncertainty,
  withFitScatter,
  type ReadingInput,
  type ReadingUncertainty,
} from '../../../core';
import { expectClose } from '../../helpers/expect-close';
import { POUND_FORCE, SIXTY_F, drakeConductor, drakeSection } from './drake-section';

const section = drakeSection({ spanLengths: [180, 213.36, 240] });
const geometry = { span: 213.36, rise: 6 };
const temperature = 27;
const designSag = designAtTemperature(section, geometry, temperature, 'initial').midspanSag;
/** A careful crew: sag read to ±1 cm, conductor temperature known to ±0.5 °C (illustrative, not defaults). */
const careful: Partial<ReadingUncertainty> = { sag: 0.01, temperature: 0.5 };

function sagReading(sag: number, id?: string, uncertainty = careful): ReadingInput {
  const reading: ReadingInput = {
    geometry,
    measurement: { method: 'midspan-sag', sag },
    conductorTemperature: temperature,
    uncertainty,
  };
  if (id !== undefined) reading.id = id;
  return reading;
}

describe('assessReading', () => {
  it('finds a reading 0.6 m below the design sag too slack and says why with the numbers', () => {
    const result = assessReading(section, sagReading(designSag + 0.6));
    expect(result.verdict.verdict).toBe('too-slack');
    expectClose(result.verdict.sagDeviation, 0.6, 1e-9);
    expect(result.verdict.reason).toContain('+0.600 m');
    expect(result.tensionDeviation).toBeLessThan(0);
  });

  it('finds the design sag itself within tolerance, and its tension equal to the design tension', () => {
    const result = assessReading(section, sagReading(designSag));
    expect(result.verdict.verdict).toBe('within');
    expectClose(result.measured.horizontalTension, result.design.horizontalTension, 1e-9);
  });

  it('carries a reading at the design sag back to the design reference: the design tension (A → B → A)', () => {
    // [derived] the design at 27 °C came from 6300 lb at 60 °F by change of state; a wire hanging at that design
    // sag, carried back to 60 °F, must show the reference tension again.
    // Homogeneous (linear-elastic) conductor: the change of state is path independent, so to 1e-9.
    const homogeneous = { ...section, conductor: drakeConductor(false) };
    const sag = designAtTemperature(homogeneous, geometry, temperature, 'initial').midspanSag;
    const result = assessReading(homogeneous, sagReading(sag));
    expect(result.atCommonTemperature.temperature).toBe(SIXTY_F);
    expectClose(result.atCommonTemperature.horizontalTension, 6300 * POUND_FORCE, 1e-9);
    // Steel-cored: the knee-point model takes both materials to share one zero-stress length at the known state,
    // so going out from the design state and back from the measured one differs at second order (≈ 2e-6 here).
    const composite = assessReading(section, sagReading(designSag));
    expectClose(composite.atCommonTemperature.horizontalTension, 6300 * POUND_FORCE, 1e-5);
  });

  it('asks for a recheck when the default uncertainties straddle the limit', () => {
    // deviation +0.12 m with the default σ (sag 0.05 m, temperature 1 °C, from memory): band reaches past +0.15 m,
    // and the sag reading itself is the largest contributor on this 213 m span.
    const result = assessReading(section, sagReading(designSag + 0.12, undefined, {}));
    expect(result.verdict.verdict).toBe('recheck');
    expect(result.uncertainty.contributions[0]?.input).toBe('sag');
    expect(result.uncertainty.contributions[1]?.input).toBe('conductor temperature');
  });

  it('projects the hot-day wire and checks the clearance against the required one', () => {
    const reading: ReadingInput = {
      ...sagReading(designSag),
      site: {
        nearAttachmentElevation: 16,
        groundPoints: [
          { x: 0, elevation: 0 },
          { x: 213.36, elevation: 4 },
        ],
        requiredClearance: 6.1, // PUCSL table, 1–11 kV over roads (published example; local codes govern)
      },
    };
    const result = assessReading(section, reading);
    const clearance = result.clearance;
    expect(clearance).toBeDefined();
    if (!clearance) return;
    expect(clearance.horizontalTension).toBeLessThan(result.measured.horizontalTension);
    const hot = spanAtTension(geometry, section.conductor.weight, clearance.horizontalTension);
    expectClose(clearance.midspanSag, hot.midspanSag, 1e-12);
    expect(clearance.midspanSag).toBeGreaterThan(result.measured.midspanSag);
    expectClose(clearance.margin ?? Number.NaN, clearance.minimumClearance - 6.1, 1e-12);
    expect(['pass', 'marginal', 'fail']).toContain(clearance.status);
    expect(clearance.caution).toContain('local code');
  });

  it('passes on the solver error code for an impossible reading (sag-not-positive)', () => {
    let code: string | undefined;
    try {
      assessReading(section, sagReading(-1));
    } catch (error) {
      code = error instanceof SpanInputError ? error.code : 'other';
    }
    expect(code).toBe('sag-not-positive');
  });
});

describe('assessWire and assessSection', () => {
  it('combines agreeing readings and points out the one that disagrees', () => {
    const readings = [
      assessReading(section, sagReading(designSag + 0.02, 'first')),
      assessReading(section, sagReading(designSag - 0.01, 'second')),
      assessReading(section, sagReading(designSag + 0.4, 'third')),
    ];
    const wire = assessWire(readings);
    expect(wire.disagreeing.map((d) => d.id)).toEqual(['third']);
    expect(wire.consistent).toBe(false);
    expect(wire.verdict.reason).toContain('third');
    const agreeing = assessWire(readings.slice(0, 2));
    expect(agreeing.disagreeing).toEqual([]);
    // equal uncertainties → the combined deviation is close to the plain mean of +0.02 and −0.01 m
    expectClose(agreeing.combinedSagDeviation.value, 0.005, 0.05);
    expect(agreeing.combinedSagDeviation.sigma).toBeLessThan(
      readings[0]?.uncertainty.sagDeviation.sigma ?? 0,
    );
  });

  it('ranks the worst wires first and names the span whose tension stands apart', () => {
    const offsets = [0.0, 0.03, -0.02, 0.01, 0.8];
    const wires = offsets.map((offset, i) => ({
      id: `span-${i + 1}`,
      wire: assessWire([assessReading(section, sagReading(designSag + offset))]),
    }));
    const summary = assessSection(wires);
    expect(summary.counts['too-slack']).toBe(1);
    expect(summary.counts.within).toBe(4);
    expect(summary.worstFirst[0]).toBe('span-5');
    expect(summary.spread[0]?.outliers).toEqual(['span-5']);
  });
});

describe('assessWire edge cases', () => {
  it('combines readings taken as exact (all uncertainties 0) by their plain mean', () => {
    const exact: Partial<ReadingUncertainty> = {
      span: 0,
      rise: 0,
      weightRelative: 0,
      temperature: 0,
      sag: 0,
      elevation: 0,
    };
    const wire = assessWire([
      assessReading(section, sagReading(designSag + 0.1, 'a', exact)),
      assessReading(section, sagReading(designSag + 0.18, 'b', exact)),
    ]);
    expectClose(wire.combinedSagDeviation.value, 0.14, 1e-9);
    expect(wire.combinedSagDeviation.sigma).toBe(0);
    // +0.14 m, inside the ±0.15 m of IEEE Std 524 (handbook), with no band: within.
    expect(wire.verdict.verdict).toBe('within');
    expect(wire.excluded).toEqual([]);
  });
});

describe('surveyed points', () => {
  const h = 27000;
  const truth = spanAtTension(geometry, section.conductor.weight, h);
  const lowX = truth.lowPointX;
  const c = truth.catenaryParameter;
  // Six shots on the wire, every other one 0.2 m off (a deliberately poor survey).
  const points = [20, 60, 90, 120, 150, 190].map((x, i) => ({
    x,
    z: 2 * c * Math.sinh((x - 2 * lowX) / (2 * c)) * Math.sinh(x / (2 * c)) + (i % 2 === 0 ? 0.2 : -0.2),
  }));
  const reading: ReadingInput = {
    geometry,
    measurement: { method: 'surveyed-points', points },
    conductorTemperature: temperature,
  };

  it('widens the band to the scatter of the points about the fit when it exceeds the stated σ', () => {
    // Common practice (least squares): residual σ̂ = RMS·√(n/(n − p)) with p = 3 fitted parameters.
    const scattered = assessReading(section, reading);
    const stated = assessReading(section, { ...reading, uncertainty: { point: 0.05 } });
    const rms = scattered.measured.fitResidual ?? Number.NaN;
    expect(rms).toBeGreaterThan(0.05);
    expect(scattered.uncertainty.horizontalTension.sigma).toBeGreaterThan(
      stated.uncertainty.horizontalTension.sigma,
    );
    // Hand computation of the raised σ: RMS·√(6/3) = RMS·√2.
    const raised = withFitScatter(resolveUncertainty(), reading, scattered.measured);
    expectClose(raised.point, rms * Math.SQRT2, 1e-12);
  });
});
