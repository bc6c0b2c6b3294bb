import { SpanInputError } from './errors';
import type { CompositeConductor, ConductorSpec } from './records/conductor';
import type { ElasticConductor } from './types';
import { METRES_PER_FOOT, METRES_PER_INCH, NEWTONS_PER_POUND_FORCE } from './units';

export type { CompositeConductor };

/**
 * Conductor library and the elastic/thermal properties derived from it. Everything SI: m, m², N, N/m, Pa, 1/°C.
 * Published sizes, strengths and weights come from CPUC General Order 95, Appendix B, Table 23 (ACSR, bare),
 * converted exactly from US units. Moduli and expansion are not in that table: they come from the rule of mixtures
 * with the stranded-conductor final moduli and expansion coefficients listed in the project references.
 */

/** lb/ft → N/m, from the exact factors of core/units (1 lbf = 0.45359237 kg × 9.80665 m/s², 1 ft = 0.3048 m). */
export const NEWTONS_PER_METRE_PER_POUND_PER_FOOT = NEWTONS_PER_POUND_FORCE / METRES_PER_FOOT;

/** Final (after settling) modulus of stranded aluminium 1350-H19 wires, Pa. [derived] project references. */
export const ALUMINIUM_FINAL_MODULUS = 55e9;
/** Final modulus of the stranded zinc-coated steel core, Pa. [derived] project references. */
export const STEEL_FINAL_MODULUS = 190e9;
/** Linear expansion of aluminium 1350-H19, 1/°C. [published] project references ("Creep and bimetallic"). */
export const ALUMINIUM_EXPANSION = 23e-6;
/** Linear expansion of zinc-coated steel wire, 1/°C. [published] project references ("Creep and bimetallic"). */
export const STEEL_EXPANSION = 11.5e-6;

/** Source strings carried beside every value. */
export const SOURCE_GO95 = 'CPUC GO 95 App. B Table 23';
export const SOURCE_DERIVED = 'derived';
export const SOURCE_FROM_MEMORY = 'from memory';

/** One conductor of the library (or entered by the user), SI. */
export interface Conductor {
  id: string;
  /** Code word (trade name used by ASTM B232), e.g. "Drake". */
  name: string;
  /** Size and stranding as printed, e.g. "795 kcmil 26/7". */
  sizeLabel: string;
  /** Overall diameter, m. */
  diameter: number;
  /** Total cross-section (aluminium + steel), m². */
  area: number;
  /** Bare weight per unit length, N/m. */
  weight: number;
  /** Rated (ultimate) strength, N. */
  ratedStrength: number;
  /** Composite modulus of elasticity, Pa (final). */
  modulus: number;
  /** Composite linear expansion, 1/°C. */
  expansion: number;
  /** Material split for the bimetallic (knee-point) model; absent for homogeneous conductors. */
  composite?: CompositeConductor;
  /** Where the values come from, in words. */
  source: string;
  /** Source of each value, field by field. */
  sources: Partial<Record<Exclude<keyof Conductor, 'sources' | 'source' | 'id'>, string>>;
}

/**
 * Composite axial stiffness and expansion of a bimetallic conductor by the rule of mixtures:
 * EA = E_a·A_a + E_s·A_s, α = (α_a·E_a·A_a + α_s·E_s·A_s)/EA (project references, "Creep and bimetallic").
 * Valid while both materials carry tension (below the knee point).
 */
export function compositeFromConductor(composite: CompositeConductor): ElasticConductor {
  checkComposite(composite);
  const aluminiumStiffness = composite.aluminiumModulus * composite.aluminiumArea;
  const steelStiffness = composite.steelModulus * composite.steelArea;
  const axialStiffness = aluminiumStiffness + steelStiffness;
  const expansion =
    (composite.aluminiumExpansion * aluminiumStiffness + composite.steelExpansion * steelStiffness) /
    axialStiffness;
  return { axialStiffness, expansion };
}

/** Steel core alone (above the knee point): EA = E_s·A_s, α = α_s. */
export function steelCoreFromConductor(composite: CompositeConductor): ElasticConductor {
  checkComposite(composite);
  return {
    axialStiffness: composite.steelModulus * composite.steelArea,
    expansion: composite.steelExpansion,
  };
}

/**
 * The linear-elastic description used by tensionAtState: from the material split when the conductor has one
 * (rule of mixtures), otherwise modulus × total area and the conductor's expansion.
 */
export function elasticFromConductor(conductor: Conductor): ElasticConductor {
  if (conductor.composite) return compositeFromConductor(conductor.composite);
  const axialStiffness = conductor.modulus * conductor.area;
  if (!Number.isFinite(axialStiffness) || axialStiffness <= 0 || !Number.isFinite(conductor.expansion)) {
    throw new SpanInputError(
      'conductor-invalid',
      'Conductor modulus, area and expansion must be valid numbers.',
    );
  }
  return { axialStiffness, expansion: conductor.expansion };
}

/** Throws 'conductor-invalid' unless every area and modulus is finite and positive and expansions are finite. */
export function checkComposite(composite: CompositeConductor): void {
  const positive = [
    composite.aluminiumArea,
    composite.steelArea,
    composite.aluminiumModulus,
    composite.steelModulus,
  ];
  if (positive.some((value) => !Number.isFinite(value) || value <= 0)) {
    throw new SpanInputError(
      'conductor-invalid',
      'Aluminium and steel areas and moduli must be numbers greater than zero.',
    );
  }
  if (!Number.isFinite(composite.aluminiumExpansion) || !Number.isFinite(composite.steelExpansion)) {
    throw new SpanInputError('conductor-invalid', 'Expansion coefficients must be numbers.');
  }
}

/**
 * Steel share of the total cross-section from the stranding geometry.
 * - Equal-wire strandings (6/1 = layers 1+6, 30/7 = 1+6+12+18, 54/7 = 1+6+12+18+24): every wire has the same
 *   diameter d (overall diameter (2k+1)·d), so the steel share is simply steelWires / allWires.
 * - 26/7: a 1+6 steel core of wire d_s under two aluminium layers (10+16) of wire d_a, so
 *   overall D = 3·d_s + 4·d_a and area A = (π/4)·(26·d_a² + 7·d_s²). With the published D and A these two
 *   equations fix d_a and d_s (the positive root of a quadratic); the steel share is 7·d_s²/(26·d_a² + 7·d_s²).
 * Units: any consistent length unit for D and area.
 */
export function steelAreaFraction(stranding: string, overallDiameter: number, totalArea: number): number {
  const [aluminiumWires, steelWires] = stranding.split('/').map(Number);
  if (aluminiumWires === undefined || steelWires === undefined) {
    throw new SpanInputError('conductor-invalid', `Unknown stranding "${stranding}".`);
  }
  const equalWireLayers: Record<string, true> = { '6/1': true, '30/7': true, '54/7': true };
  if (equalWireLayers[stranding]) return steelWires / (aluminiumWires + steelWires);
  if (stranding === '26/7') {
    const { aluminiumWire, steelWire } = strandDiameters26of7(overallDiameter, totalArea);
    const steel = 7 * steelWire * steelWire;
    return steel / (26 * aluminiumWire * aluminiumWire + steel);
  }
  throw new SpanInputError('conductor-invalid', `No stranding geometry known for "${stranding}".`);
}

/**
 * Wire diameters of a 26/7 stranding from its overall diameter D and total area A (same length unit):
 * substitute d_s = (D − 4·d_a)/3 into 26·d_a² + 7·d_s² = 4A/π, i.e.
 * (26 + 112/9)·d_a² − (56/9)·D·d_a + (7/9)·D² − 4A/π = 0, and take the root with d_s > 0.
 */
export function strandDiameters26of7(
  overallDiameter: number,
  totalArea: number,
): { aluminiumWire: number; steelWire: number } {
  const a = 26 + 112 / 9;
  const b = (-56 / 9) * overallDiameter;
  const c = (7 / 9) * overallDiameter * overallDiameter - (4 * totalArea) / Math.PI;
  const discriminant = b * b - 4 * a * c;
  if (!(discriminant >= 0)) {
    throw new SpanInputError('conductor-invalid', 'Diameter and area do not fit a 26/7 stranding.');
  }
  const aluminiumWire = (-b + Math.sqrt(discriminant)) / (2 * a);
  const steelWire = (overallDiameter - 4 * aluminiumWire) / 3;
  if (!(steelWire > 0)) {
    throw new SpanInputError('conductor-invalid', 'Diameter and area do not fit a 26/7 stranding.');
  }
  return { aluminiumWire, steelWire };
}

/** One row of GO 95 App. B Table 23, in the units printed there. */
interface PublishedAcsrRow {
  name: string;
  size: string;
  stranding: string;
  diameterInches: number;
  areaSquareInches: number;
  ultimatePounds: number;
  poundsPerFoot: number;
}

/** CPUC General Order 95, Appendix B, Table 23 (ACSR, bare), as printed. */
export const GO95_TABLE_23: readonly PublishedAcsrRow[] = [
  {
    name: 'Drake',
    size: '795 kcmil',
    stranding: '26/7',
    diameterInches: 1.108,
    areaSquareInches: 0.7261,
    ultimatePounds: 31200,
    poundsPerFoot: 1.093,
  },
  {
    name: 'Condor',
    size: '795 kcmil',
    stranding: '54/7',
    diameterInches: 1.093,
    areaSquareInches: 0.7053,
    ultimatePounds: 28500,
    poundsPerFoot: 1.023,
  },
  {
    name: 'Lark',
    size: '397.5 kcmil',
    stranding: '30/7',
    diameterInches: 0.806,
    areaSquareInches: 0.385,
    ultimatePounds: 19980,
    poundsPerFoot: 0.6206,
  },
  {
    name: 'Ibis',
    size: '397.5 kcmil',
    stranding: '26/7',
    diameterInches: 0.783,
    areaSquareInches: 0.363,
    ultimatePounds: 16190,
    poundsPerFoot: 0.5464,
  },
  {
    name: 'Partridge',
    size: '266.8 kcmil',
    stranding: '26/7',
    diameterInches: 0.642,
    areaSquareInches: 0.2436,
    ultimatePounds: 11250,
    poundsPerFoot: 0.3668,
  },
  {
    name: 'Penguin',
    size: '4/0',
    stranding: '6/1',
    diameterInches: 0.563,
    areaSquareInches: 0.1939,
    ultimatePounds: 8420,
    poundsPerFoot: 0.2921,
  },
  {
    name: 'Raven',
    size: '1/0',
    stranding: '6/1',
    diameterInches: 0.398,
    areaSquareInches: 0.0967,
    ultimatePounds: 4280,
    poundsPerFoot: 0.1456,
  },
  {
    name: 'Sparrow',
    size: '2',
    stranding: '6/1',
    diameterInches: 0.316,
    areaSquareInches: 0.0608,
    ultimatePounds: 2790,
    poundsPerFoot: 0.0916,
  },
  {
    name: 'Swan',
    size: '4',
    stranding: '6/1',
    diameterInches: 0.25,
    areaSquareInches: 0.0383,
    ultimatePounds: 1830,
    poundsPerFoot: 0.0576,
  },
];

/** Converts one published row to SI and derives the material split, composite modulus and expansion. */
export function conductorFromPublishedRow(row: PublishedAcsrRow): Conductor {
  const diameter = row.diameterInches * METRES_PER_INCH;
  const area = row.areaSquareInches * METRES_PER_INCH * METRES_PER_INCH;
  const steelShare = steelAreaFraction(row.stranding, row.diameterInches, row.areaSquareInches);
  const composite: CompositeConductor = {
    aluminiumArea: area * (1 - steelShare),
    steelArea: area * steelShare,
    aluminiumModulus: ALUMINIUM_FINAL_MODULUS,
    steelModulus: STEEL_FINAL_MODULUS,
    aluminiumExpansion: ALUMINIUM_EXPANSION,
    steelExpansion: STEEL_EXPANSION,
  };
  const elastic = compositeFromConductor(composite);
  const derivedNote = `${SOURCE_DERIVED} (rule of mixtures; steel share from ${row.stranding} stranding geometry)`;
  return {
    id: `acsr-${row.name.toLowerCase()}`,
    name: row.name,
    sizeLabel: `${row.size} ${row.stranding}`,
    diameter,
    area,
    weight: row.poundsPerFoot * NEWTONS_PER_METRE_PER_POUND_PER_FOOT,
    ratedStrength: row.ultimatePounds * NEWTONS_PER_POUND_FORCE,
    modulus: elastic.axialStiffness / area,
    expansion: elastic.expansion,
    composite,
    source: `${SOURCE_GO95}; modulus, expansion and material split ${SOURCE_DERIVED}`,
    sources: {
      name: SOURCE_GO95,
      sizeLabel: SOURCE_GO95,
      diameter: SOURCE_GO95,
      area: SOURCE_GO95,
      weight: SOURCE_GO95,
      ratedStrength: SOURCE_GO95,
      modulus: derivedNote,
      expansion: derivedNote,
      composite: derivedNote,
    },
  };
}

/** The ACSR library, SI. */
export const CONDUCTOR_LIBRARY: readonly Conductor[] = GO95_TABLE_23.map(conductorFromPublishedRow);

/** Looks a library conductor up by id (e.g. "acsr-drake") or code word (case-insensitive). */
export function findConductor(idOrName: string): Conductor | undefined {
  const key = idOrName.toLowerCase();
  return CONDUCTOR_LIBRARY.find((c) => c.id === key || c.name.toLowerCase() === key);
}

/** The name a library conductor is shown by: code word and size, e.g. "Drake 795 kcmil 26/7". */
export function libraryLabel(conductor: Conductor): string {
  return `${conductor.name} ${conductor.sizeLabel}`;
}

/** The conductor record a section stores for a library conductor: a copy, with its source and library id. */
export function conductorSpecFromLibrary(conductor: Conductor): ConductorSpec {
  return {
    name: libraryLabel(conductor),
    diameter: conductor.diameter,
    area: conductor.area,
    weight: conductor.weight,
    ratedStrength: conductor.ratedStrength,
    modulus: conductor.modulus,
    expansion: conductor.expansion,
    ...(conductor.composite ? { composite: { ...conductor.composite } } : {}),
    source: conductor.source,
    libraryId: conductor.id,
  };
}
