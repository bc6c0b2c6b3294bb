import { describe, expect, it } from 'vitest';
import {
  DEFAULT_CREEP_TEMPERATURE_OFFSET,
  findConductor,
  spanAtTension,
  tensionAtStateComposite,
  type CompositeConductor,
} from '../../core';
import { FOOT, handbookDrake700, POUND_FORCE } from '../fixtures/textbook-examples';

// Douglass & Thrash, "Sag and Tension of Conductor", Electric Power Engineering Handbook, Table 14.5 (Drake,
// 700 ft): the bare-wire rows from the 60 °F initial design condition of 6300 lb. The handbook computed them with
// non-linear stress-strain-creep curves; Spanlog's state change is linear-elastic with final moduli (55 GPa
// aluminium, 190 GPa steel, REFERENCES "Creep and bimetallic"). So the rows are a plausibility band, not exact
// checks: the linear wire is stiffer than the table's initial curve, so its sags swing more with temperature.
// Bands below are what this model reaches (worst initial row 8.2 % at 0 °F; worst final row 7.2 % at 167 °F);
// tighter agreement needs the non-linear curves, which the app does not model.
const INITIAL_SAG_BAND = 0.09;
const FINAL_SAG_BAND = 0.08;

const toCelsius = (fahrenheit: number): number => ((fahrenheit - 32) * 5) / 9;

describe('Handbook Table 14.5 rows as a plausibility band for the linear state change', () => {
  const table = handbookDrake700;
  const drake = findConductor('drake');
  const composite: CompositeConductor | undefined = drake?.composite;
  const g = { span: table.spanFeet * FOOT, rise: 0 };
  const w = table.weightPoundsPerFoot * (POUND_FORCE / FOOT);
  const from = {
    horizontalTension: table.design.tensionPounds * POUND_FORCE,
    temperature: toCelsius(table.design.temperatureF),
    weight: w,
  };
  const sagFeetAt = (celsius: number): number => {
    if (!composite) throw new Error('Drake has no steel-core description in the library');
    const h = tensionAtStateComposite(g, composite, from, { temperature: celsius, weight: w });
    return spanAtTension(g, w, h).midspanSag / FOOT;
  };

  it.each(
    table.bareRows.map(([fahrenheit, initialSag, , finalSag]) => ({ fahrenheit, initialSag, finalSag })),
  )(
    'at $fahrenheit °F the initial sag is within 9 % and the final sag (initial + 21 °C creep) within 8 %',
    ({ fahrenheit, initialSag, finalSag }) => {
      const initial = sagFeetAt(toCelsius(fahrenheit));
      const final = sagFeetAt(toCelsius(fahrenheit) + DEFAULT_CREEP_TEMPERATURE_OFFSET);
      expect(Math.abs(initial / initialSag - 1)).toBeLessThan(INITIAL_SAG_BAND);
      expect(Math.abs(final / finalSag - 1)).toBeLessThan(FINAL_SAG_BAND);
    },
  );

  it('keeps the table order: sag grows with temperature, final above initial', () => {
    const temperatures = table.bareRows.map((row) => toCelsius(row[0]));
    const initial = temperatures.map((t) => sagFeetAt(t));
    const final = temperatures.map((t) => sagFeetAt(t + DEFAULT_CREEP_TEMPERATURE_OFFSET));
    for (let i = 1; i < initial.length; i++) expect(initial[i]).toBeGreaterThan(initial[i - 1]!);
    initial.forEach((sag, i) => expect(final[i]).toBeGreaterThan(sag));
  });
});
