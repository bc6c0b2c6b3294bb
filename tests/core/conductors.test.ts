import { describe, expect, it } from 'vitest';
import {
  CONDUCTOR_LIBRARY,
  compositeFromConductor,
  elasticFromConductor,
  findConductor,
  GO95_TABLE_23,
  steelAreaFraction,
  steelCoreFromConductor,
  strandDiameters26of7,
  type Conductor,
} from '../../core';
import { expectClose } from '../helpers/expect-close';
import { expectCode } from '../helpers/expect-code';

const INCH = 0.0254; // m, exact
const FOOT = 0.3048; // m, exact
const POUND_FORCE = 4.4482216152605; // N, exact (0.45359237 kg × 9.80665 m/s²)
const GO95 = 'CPUC GO 95 App. B Table 23';

function library(name: string): Conductor {
  const c = findConductor(name);
  if (!c) throw new Error(`${name} missing from the library`);
  return c;
}

describe('conductor library (CPUC GO 95 App. B Table 23, ACSR)', () => {
  it('converts Drake exactly from the published US figures', () => {
    const drake = library('Drake');
    // GO 95 Table 23: Drake 1.108 in, 0.7261 in², 31,200 lb, 1.093 lb/ft.
    expectClose(drake.weight, (1.093 * POUND_FORCE) / FOOT, 1e-15, `${GO95} weight`);
    expectClose(drake.weight, 15.95114, 1e-6, `${GO95} weight, hand-converted 15.95114 N/m`);
    expectClose(drake.diameter, 1.108 * INCH, 1e-15, `${GO95} diameter`);
    expectClose(drake.area, 0.7261 * INCH * INCH, 1e-15, `${GO95} area`);
    expectClose(drake.ratedStrength, 31200 * POUND_FORCE, 1e-15, `${GO95} strength`);
    expect(drake.sizeLabel).toBe('795 kcmil 26/7');
  });

  it('holds every table row, each value with its source', () => {
    expect(CONDUCTOR_LIBRARY.map((c) => c.name)).toEqual(GO95_TABLE_23.map((r) => r.name));
    for (const c of CONDUCTOR_LIBRARY) {
      expect(c.sources.weight).toBe(GO95);
      expect(c.sources.ratedStrength).toBe(GO95);
      expect(c.sources.modulus).toMatch(/^derived/);
      expect(c.sources.composite).toMatch(/^derived/);
      expect(c.source).toContain(GO95);
      expect(findConductor(c.id)).toBe(c);
    }
    expect(findConductor('no-such-wire')).toBeUndefined();
  });

  it('26/7 wire diameters derived from the published D and A match ASTM B232 strand sizes (from memory)', () => {
    // From memory (ASTM B232 strand tables): Drake 0.1749/0.1360 in, Ibis 0.1236/0.0961 in,
    // Partridge 0.1013/0.0788 in (aluminium/steel wire diameters).
    const expected: Record<string, [number, number]> = {
      Drake: [0.1749, 0.136],
      Ibis: [0.1236, 0.0961],
      Partridge: [0.1013, 0.0788],
    };
    for (const row of GO95_TABLE_23.filter((r) => r.stranding === '26/7')) {
      const wires = strandDiameters26of7(row.diameterInches, row.areaSquareInches);
      const memory = expected[row.name];
      if (!memory) throw new Error(`no strand sizes for ${row.name}`);
      expectClose(wires.aluminiumWire, memory[0], 5e-3, `${row.name} aluminium wire`);
      expectClose(wires.steelWire, memory[1], 5e-3, `${row.name} steel wire`);
    }
  });

  it('equal-wire strandings (6/1, 30/7, 54/7) are consistent with the published diameter and area', () => {
    // Derived: 1+6(+12+18(+24)) layers of wire d give D = (2k+1)·d and A = N·π·d²/4; the published D and A agree
    // to 0.5 %, which supports the equal-wire steel share used for these strandings.
    const layers: Record<string, { wires: number; diametersAcross: number }> = {
      '6/1': { wires: 7, diametersAcross: 3 },
      '30/7': { wires: 37, diametersAcross: 7 },
      '54/7': { wires: 61, diametersAcross: 9 },
    };
    for (const row of GO95_TABLE_23) {
      const geometry = layers[row.stranding];
      if (!geometry) continue;
      const d = row.diameterInches / geometry.diametersAcross;
      expectClose((geometry.wires * Math.PI * d * d) / 4, row.areaSquareInches, 5e-3, `${row.name} area`);
    }
    expectClose(steelAreaFraction('30/7', 0.806, 0.385), 7 / 37, 1e-15, 'Lark steel share');
  });

  it('published weight exceeds density × derived areas by the stranding lay increment, 0.5–3 %', () => {
    // Densities from memory (IEC 60889 aluminium 2703 kg/m³, IEC 60888 steel 7780 kg/m³); stranded wires are
    // longer than the conductor by their lay, 1–2.5 % more mass (from memory). A wrong steel share would show here.
    for (const c of CONDUCTOR_LIBRARY) {
      if (!c.composite) throw new Error(`${c.name} has no material split`);
      const straightMass = c.composite.aluminiumArea * 2703 + c.composite.steelArea * 7780;
      const ratio = c.weight / 9.80665 / straightMass;
      expect(ratio, c.name).toBeGreaterThan(1.005);
      expect(ratio, c.name).toBeLessThan(1.03);
    }
  });

  it('26/7 composite expansion is about 18.9e-6 /°C (catalogue value, from memory)', () => {
    expectClose(library('Drake').expansion, 18.9e-6, 1e-2, 'Drake expansion');
  });
});

describe('rule of mixtures', () => {
  it('gives EA and α by hand for a simple split (REFERENCES, Creep and bimetallic)', () => {
    // By hand: EA = 55e9·4e-4 + 190e9·1e-4 = 2.2e7 + 1.9e7 = 4.1e7 N;
    // α = (23e-6·2.2e7 + 11.5e-6·1.9e7)/4.1e7 = (506 + 218.5)/41 e-6 = 17.6707e-6 /°C.
    const split = {
      aluminiumArea: 4e-4,
      steelArea: 1e-4,
      aluminiumModulus: 55e9,
      steelModulus: 190e9,
      aluminiumExpansion: 23e-6,
      steelExpansion: 11.5e-6,
    };
    const elastic = compositeFromConductor(split);
    expectClose(elastic.axialStiffness, 4.1e7, 1e-12, 'EA');
    expectClose(elastic.expansion, 17.6707e-6, 1e-5, 'α');
    const steel = steelCoreFromConductor(split);
    expectClose(steel.axialStiffness, 1.9e7, 1e-12, 'steel EA');
    expectClose(steel.expansion, 11.5e-6, 1e-15, 'steel α');
  });

  it('elasticFromConductor uses modulus × area when there is no material split', () => {
    const copper: Conductor = {
      ...library('Raven'),
      composite: undefined,
      modulus: 1.2e11,
      area: 5e-5,
      expansion: 17e-6,
    };
    const elastic = elasticFromConductor(copper);
    expectClose(elastic.axialStiffness, 6e6, 1e-12, 'EA');
    expectClose(elastic.expansion, 17e-6, 1e-15, 'α');
    expectCode(() => elasticFromConductor({ ...copper, modulus: 0 }), 'conductor-invalid');
  });

  it('rejects unknown strandings and impossible splits by code', () => {
    expectCode(() => steelAreaFraction('12/7', 0.5, 0.1), 'conductor-invalid');
    expectCode(() => steelAreaFraction('abc', 0.5, 0.1), 'conductor-invalid');
    expectCode(() => strandDiameters26of7(1.0, 2.0), 'conductor-invalid');
    expectCode(
      () =>
        compositeFromConductor({
          aluminiumArea: 0,
          steelArea: 1e-4,
          aluminiumModulus: 55e9,
          steelModulus: 190e9,
          aluminiumExpansion: 23e-6,
          steelExpansion: 11.5e-6,
        }),
      'conductor-invalid',
    );
  });
});
