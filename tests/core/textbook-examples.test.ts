import { describe, expect, it } from 'vitest';
import {
  classicStateChangeCubic,
  conductorLoad,
  DEFAULT_CREEP_TEMPERATURE_OFFSET,
  lowPointX,
  spanAtTension,
  tensionAtState,
  wireElevation,
} from '../../core';
import {
  FOOT,
  KILOGRAM_FORCE,
  POUND_FORCE,
  guptaE12,
  guptaE16,
  guptaE2,
  handbookDrake700,
  wadhwa72,
  wadhwa73,
  wadhwa74,
} from '../fixtures/textbook-examples';
import { expectClose } from '../helpers/expect-close';

/**
 * The books solved these with the parabola (uniform load per horizontal length, tension taken as H everywhere).
 * Each test first recomputes what the book computed, to the precision it printed, then shows that the exact
 * catenary lands within the small difference the parabola is known to make (relative ≈ (S/C)²/96 on sag).
 */

/** Relative half-unit of the last printed digit: the precision a printed figure carries. */
function printedPrecision(printed: number, lastDigit: number): number {
  return (0.5 * lastDigit) / Math.abs(printed);
}

describe('Gupta Ex. E2: level span, clearance and support height', () => {
  const e = guptaE2;
  const w = (e.weightKgPerKm / 1000) * KILOGRAM_FORCE;
  const allowed = (e.ultimateKg / e.safetyFactor) * KILOGRAM_FORCE;

  it('parabola reproduces the printed sag 3.707 m and support height 13.7 m', () => {
    const parabolicSag = (w * e.span ** 2) / (8 * allowed);
    expectClose(parabolicSag, e.printedSag, printedPrecision(e.printedSag, 0.001), e.source);
    expectClose(
      e.groundClearance + parabolicSag,
      e.printedSupportHeight,
      printedPrecision(13.7, 0.1),
      e.source,
    );
  });

  it('exact catenary sag lies within 0.3 % above the parabola whether 1550 kgf is H or the support tension', () => {
    // The book does not say whether the working tension is horizontal or at the support; with S/C ≈ 0.11 the
    // two readings change the sag by 0.2 %, below the 13.7 m answer's precision but not 3.707's.
    const atH = spanAtTension({ span: e.span, rise: 0 }, w, allowed);
    const atSupport = spanAtTension({ span: e.span, rise: 0 }, w, allowed - w * atH.midspanSag);
    for (const s of [atH, atSupport]) {
      expectClose(s.midspanSag, e.printedSag, 3e-3, `${e.source} exact`);
      expectClose(
        e.groundClearance + s.midspanSag,
        e.printedSupportHeight,
        printedPrecision(13.7, 0.1),
        e.source,
      );
    }
  });
});

describe('Wadhwa Ex. 7.2: ice and wind', () => {
  const e = wadhwa72;
  const load = conductorLoad({
    bareWeight: e.weightKgPerM * KILOGRAM_FORCE,
    diameter: e.diameter,
    iceThickness: e.iceThickness,
    iceDensity: e.iceDensity,
    windPressure: e.windKgPerSquareMetre * KILOGRAM_FORCE,
  });
  const allowed = (e.ultimateKg / e.safetyFactor) * KILOGRAM_FORCE;

  it('parabola on the resultant load reproduces the printed maximum (slant) sag 6.422 m', () => {
    const parabolicSag = (load.resultant * e.span ** 2) / (8 * allowed);
    expectClose(parabolicSag, e.printedMaxSag, printedPrecision(e.printedMaxSag, 0.001), e.source);
  });

  it('exact catenary sag on the resultant load is within 0.2 % of the printed figure', () => {
    // S/C ≈ 0.19 here, so the catenary sag exceeds the parabola by about (S/C)²/96 ≈ 0.04 %… plus rounding.
    const exact = spanAtTension({ span: e.span, rise: 0 }, load.resultant, allowed);
    expectClose(exact.midspanSag, e.printedMaxSag, 2e-3, `${e.source} exact`);
  });
});

describe('Gupta Ex. E12: supports at different levels', () => {
  const e = guptaE12;
  const w = (e.weightKgPerM + e.iceKgPerM) * KILOGRAM_FORCE;
  const allowed = ((e.ultimateStressKgPerSquareCm * e.areaSquareCm) / e.safetyFactor) * KILOGRAM_FORCE;

  it('parabola reproduces the printed sag from the taller support, 45.27 m', () => {
    // Book: lowest point at x₁ = S/2 − T·h/(w·S) from the lower support; sag from the taller one w·(S − x₁)²/(2T).
    const x1 = e.span / 2 - (allowed * e.heightDifference) / (w * e.span);
    const sagFromTaller = (w * (e.span - x1) ** 2) / (2 * allowed);
    expectClose(sagFromTaller, e.printedSagFromTallerSupport, printedPrecision(45.27, 0.01), e.source);
  });

  it('exact catenary (H = working tension) gives a sag from the taller support within 1 % above it', () => {
    // S/C ≈ 0.5 on this long heavy span: the catenary sits measurably lower than the parabola (≈ 0.6 %).
    const c = allowed / w;
    const xm = lowPointX(e.span, e.heightDifference, c);
    const sagFromTaller = e.heightDifference - wireElevation(xm, c, xm);
    expectClose(sagFromTaller, e.printedSagFromTallerSupport, 1e-2, `${e.source} exact`);
    expect(sagFromTaller).toBeGreaterThan(e.printedSagFromTallerSupport);
  });
});

describe('Wadhwa Ex. 7.4: river crossing, lowest point outside the span', () => {
  const e = wadhwa74;
  const w = e.weightKgPerM * KILOGRAM_FORCE;
  const h = e.tensionKg * KILOGRAM_FORCE;
  const rise = e.higherTowerHeight - e.lowerTowerHeight;

  it('parabola reproduces the printed clearance midway 54.375 m and low point 250 m beyond the lower tower', () => {
    const x1 = e.span / 2 - (h * rise) / (w * e.span); // from the lower tower, negative = outside the span
    const lowPointElevation = e.lowerTowerHeight - (w * x1 ** 2) / (2 * h);
    const midway = lowPointElevation + (w * (e.span / 2 - x1) ** 2) / (2 * h);
    expectClose(-x1, e.printedLowPointBeyondLowerTower, 1e-12, e.source);
    expectClose(midway, e.printedClearanceMidway, printedPrecision(54.375, 0.001), e.source);
  });

  it('exact catenary keeps the low point outside the span and the clearance within 0.3 %', () => {
    // The catenary's load is per metre of wire, so on this 20 % slope it carries sec θ = √(1 + (h/S)²) ≈ 1.02
    // times the parabola's load per horizontal metre: the midspan sag is ≈ 2 % larger (5.74 m against 5.625 m)
    // and the clearance ≈ 0.11 m lower. The low point moves by about 1 % for the same reason.
    const c = h / w;
    const xm = lowPointX(e.span, rise, c);
    const midway = e.lowerTowerHeight + wireElevation(e.span / 2, c, xm);
    const parabolicSag = (rise + 2 * e.lowerTowerHeight) / 2 - e.printedClearanceMidway;
    const exactSag = spanAtTension({ span: e.span, rise }, w, h).midspanSag;
    expectClose(
      exactSag,
      parabolicSag * Math.hypot(1, rise / e.span),
      2e-3,
      `${e.source} exact sag vs sec θ rule`,
    );
    expectClose(midway, e.printedClearanceMidway, 3e-3, `${e.source} exact clearance`);
    expectClose(-xm, e.printedLowPointBeyondLowerTower, 2e-2, `${e.source} exact low point`);
    expect(xm).toBeLessThan(0);
  });
});

describe('Gupta Ex. E16: change of state from wind at 5 °C to still air at 35 °C', () => {
  const e = guptaE16;
  const area = e.areaSquareCm * 1e-4;
  const conductor = {
    axialStiffness: e.modulusKgPerSquareMm * 1e6 * KILOGRAM_FORCE * area,
    expansion: e.expansion,
  };
  const bare = e.weightKgPerM * KILOGRAM_FORCE;
  const wind = e.windKgPerSquareMetre * KILOGRAM_FORCE * e.diameter;
  const from = {
    horizontalTension: e.worstTensionKg * KILOGRAM_FORCE,
    temperature: e.worstTemperature,
    weight: Math.hypot(bare, wind),
  };
  const to = { temperature: e.erectionTemperature, weight: bare };

  it('classic cubic reproduces T₂ = 2877 kg and erection sag 2.308 m', () => {
    const t2 = classicStateChangeCubic(e.span, conductor, from, to);
    expectClose(t2 / KILOGRAM_FORCE, e.printedErectionTensionKg, printedPrecision(2877, 1), e.source);
    expectClose(
      (bare * e.span ** 2) / (8 * t2),
      e.printedErectionSag,
      printedPrecision(2.308, 0.001),
      e.source,
    );
  });

  it('exact state change agrees with the printed answers within 0.1 %', () => {
    // Sag/span ≈ 0.9 %: the cubic's parabolic slack and uniform tension cost about 0.04 % in T₂ here.
    const t2 = tensionAtState({ span: e.span, rise: 0 }, conductor, from, to);
    expectClose(t2 / KILOGRAM_FORCE, e.printedErectionTensionKg, 1e-3, `${e.source} exact`);
    const sag = spanAtTension({ span: e.span, rise: 0 }, bare, t2).midspanSag;
    expectClose(sag, e.printedErectionSag, 1e-3, `${e.source} exact`);
  });
});

describe('Wadhwa Ex. 7.3: copper, change of state from wind at 4.5 °C to still air at 32.2 °C', () => {
  const e = wadhwa73;
  const area = e.areaSquareMm * 1e-6;
  const conductor = {
    axialStiffness: e.modulusKgPerSquareMm * 1e6 * KILOGRAM_FORCE * area,
    expansion: e.expansion,
  };
  const bare = e.weightKgPerM * KILOGRAM_FORCE;
  const wind = e.windKgPerSquareMetre * KILOGRAM_FORCE * e.diameter;
  const from = {
    horizontalTension: e.workingStressKgPerSquareMm * 1e6 * KILOGRAM_FORCE * area,
    temperature: e.firstTemperature,
    weight: Math.hypot(bare, wind),
  };
  const to = { temperature: e.secondTemperature, weight: bare };
  const stressKgPerSquareMm = (tension: number): number => tension / KILOGRAM_FORCE / e.areaSquareMm;

  it('classic cubic reproduces σ₂ = 14.82 kg/mm² to the four figures printed', () => {
    // The cubic gives 14.827; the book prints 14.82 (truncated, or its trial solution stopped there): one unit
    // in the fourth figure, 7e-4 relative.
    const t2 = classicStateChangeCubic(e.span, conductor, from, to);
    expectClose(stressKgPerSquareMm(t2), e.printedSecondStressKgPerSquareMm, 7e-4, e.source);
  });

  it('sag at 32.2 °C: the recomputed 0.1544 m from the printed σ₂, not the printed 0.1534 m', () => {
    // 0.1157 × 45.7² / (8 × 14.82 × 13.2) = 0.1544 m: the printed 0.1534 m does not follow from the book's own
    // σ₂ (a slip of one digit), so the recomputed value is the check, as the project references direct.
    const recomputedSag =
      (e.weightKgPerM * e.span ** 2) / (8 * e.printedSecondStressKgPerSquareMm * e.areaSquareMm);
    const t2 = classicStateChangeCubic(e.span, conductor, from, to);
    expectClose((bare * e.span ** 2) / (8 * t2), recomputedSag, 7e-4, `${e.source} recomputed`);
    const exact = tensionAtState({ span: e.span, rise: 0 }, conductor, from, to);
    const exactSag = spanAtTension({ span: e.span, rise: 0 }, bare, exact).midspanSag;
    expectClose(exactSag, recomputedSag, 1e-3, `${e.source} exact`);
    expectClose(stressKgPerSquareMm(exact), e.printedSecondStressKgPerSquareMm, 7e-4, `${e.source} exact`);
  });
});

describe('Handbook Table 14.5: Drake 795 kcmil 26/7, 700 ft span, design 6300 lb at 60 °F', () => {
  const e = handbookDrake700;
  const g = { span: e.spanFeet * FOOT, rise: 0 };
  const w = e.weightPoundsPerFoot * (POUND_FORCE / FOOT);
  const tension = e.design.tensionPounds * POUND_FORCE;
  const printed = e.design.sagFeet;

  it('exact catenary sag is 10.65 ft to the printed precision when the tabulated tension is (H + support)/2', () => {
    // Read as H the tabulated 6300 lb gives 10.639 ft; read as the support tension, 10.659 ft; the printed 10.65
    // lies between, and reading it as the average of H and the support tension, H + w·D/2, gives 10.649 ft.
    const atH = spanAtTension(g, w, tension).midspanSag / FOOT;
    const hAverage = tension - (w * atH * FOOT) / 2;
    const sagAverage = spanAtTension(g, w, hAverage).midspanSag / FOOT;
    expectClose(sagAverage, printed, printedPrecision(printed, 0.01), e.source);
    // Whatever the reading, the exact sag is within 0.15 % of the printed one.
    expectClose(atH, printed, 1.5e-3, `${e.source} as H`);
  });

  it('the final 60 °F sag matches an initial sag about 21 °C warmer: the creep allowance', () => {
    // Interpolating the table's own initial sags: where does the initial curve reach the final 60 °F sag?
    const final60 = e.bareRows.find((row) => row[0] === 60);
    if (!final60) throw new Error('fixture row missing');
    const finalSag = final60[3];
    const rows = e.bareRows;
    let equivalentF = Number.NaN;
    for (let i = 0; i + 1 < rows.length; i++) {
      const a = rows[i];
      const b = rows[i + 1];
      if (a && b && a[1] <= finalSag && finalSag <= b[1]) {
        equivalentF = a[0] + ((finalSag - a[1]) / (b[1] - a[1])) * (b[0] - a[0]);
      }
    }
    const offsetCelsius = ((equivalentF - 60) * 5) / 9;
    // REFERENCES "Creep and bimetallic": ≈ +21 °C derived from the Drake and Arbutus tables.
    expectClose(offsetCelsius, DEFAULT_CREEP_TEMPERATURE_OFFSET, 0.05, 'creep offset from Table 14.5');
  });
});
