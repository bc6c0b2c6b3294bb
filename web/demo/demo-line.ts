// The demo line: an invented 12.47 kV feeder in an invented valley, with two tension sections, a dozen spans and
// readings by every method. Readings are made by forward-computing the exact catenary from chosen tensions (then
// rounded as an instrument would read them), so they solve sensibly; a few spans are left slack or tight on
// purpose so the design checks have something to find.
import { spanAtTension, wireElevation } from '../../core/catenary';
import {
  conductorSpecFromLibrary,
  elasticFromConductor,
  findConductor,
  type Conductor,
} from '../../core/conductors';
import type { RecordSet } from '../../core/records/kinds';
import { newRecordMeta, type RecordMeta } from '../../core/records/meta';
import type { ReadingRecord } from '../../core/records/reading';
import type { SectionRecord } from '../../core/records/section';
import type { SpanRecord } from '../../core/records/span';
import type { StructureRecord } from '../../core/records/structure';
import type { WireRecord } from '../../core/records/wire';
import { tensionAtState } from '../../core/state-change';
import type { Measurement, MethodId, SpanGeometry } from '../../core/types';

export interface DemoOptions {
  now: Date;
  newId: () => string;
  deviceId: string;
}

/** One structure of the demo: label, ground elevation (m), attachment height (m), position (deg). */
const STRUCTURES: [string, number, number, number, number][] = [
  ['1', 412.0, 11.0, 44.31262, -121.50811],
  ['2', 413.5, 10.7, 44.31301, -121.50712],
  ['3', 415.2, 10.7, 44.31355, -121.50573],
  ['4', 414.0, 11.3, 44.31418, -121.50408],
  ['5', 416.8, 10.7, 44.31461, -121.50297],
  ['6', 431.5, 11.3, 44.31539, -121.50091],
  ['7', 433.0, 12.2, 44.31567, -121.50018],
  ['8', 436.0, 11.6, 44.3166, -121.4978],
  ['9', 398.0, 13.7, 44.31771, -121.49504],
  ['10', 396.5, 11.6, 44.3184, -121.49337],
  ['11', 399.0, 11.0, 44.31893, -121.49202],
  ['12', 411.0, 11.6, 44.31953, -121.49052],
  ['13', 412.4, 11.0, 44.31987, -121.48966],
];

interface DemoSpan {
  /** Index of the near structure in STRUCTURES (far is the next one). */
  near: number;
  length: number;
  section: 0 | 1;
  /** Tension of the wire as found, as a multiple of the design tension at the reading temperature. */
  found: number;
  method: MethodId;
  conductorTemperature: number;
  inspector: string;
  /** Read the neutral as well (by midspan sag). */
  neutral?: boolean;
  notes?: string;
}

const INSPECTORS = ['Rosa Ilunga', 'Tomas Brekke', 'Ada Whitcombe'] as const;

const SPANS: DemoSpan[] = [
  {
    near: 0,
    length: 86,
    section: 0,
    found: 1.0,
    method: 'midspan-sag',
    conductorTemperature: 17.5,
    inspector: INSPECTORS[0],
    neutral: true,
  },
  {
    near: 1,
    length: 121,
    section: 0,
    found: 1.02,
    method: 'sight-line',
    conductorTemperature: 18.0,
    inspector: INSPECTORS[0],
  },
  {
    near: 2,
    length: 143,
    section: 0,
    found: 0.78,
    method: 'return-wave',
    conductorTemperature: 19.5,
    inspector: INSPECTORS[1],
    notes: 'Looks low over the orchard lane; slack compared with its neighbours.',
  },
  {
    near: 3,
    length: 97,
    section: 0,
    found: 0.98,
    method: 'offset-sag',
    conductorTemperature: 21.0,
    inspector: INSPECTORS[1],
    notes: 'Midspan over the irrigation ditch: read at 30 m from Str 4.',
  },
  {
    near: 4,
    length: 182,
    section: 0,
    found: 1.24,
    method: 'sight-angle',
    conductorTemperature: 22.5,
    inspector: INSPECTORS[1],
    notes: 'Climbs toward the bench at Str 6; looks pulled up since the anchor at Str 6 was reset.',
  },
  {
    near: 5,
    length: 64,
    section: 0,
    found: 1.22,
    method: 'midspan-sag',
    conductorTemperature: 23.0,
    inspector: INSPECTORS[0],
    notes: 'Short dead-end span, pulled tight.',
  },
  {
    near: 6,
    length: 212,
    section: 1,
    found: 0.99,
    method: 'surveyed-points',
    conductorTemperature: 24.5,
    inspector: INSPECTORS[2],
    neutral: true,
  },
  {
    near: 7,
    length: 246,
    section: 1,
    found: 1.0,
    method: 'sight-line',
    conductorTemperature: 25.0,
    inspector: INSPECTORS[2],
    notes: 'Steep drop to the Wren Creek crossing.',
  },
  {
    near: 8,
    length: 151,
    section: 1,
    found: 1.03,
    method: 'return-wave',
    conductorTemperature: 26.5,
    inspector: INSPECTORS[2],
  },
  {
    near: 9,
    length: 118,
    section: 1,
    found: 0.83,
    method: 'midspan-sag',
    conductorTemperature: 27.0,
    inspector: INSPECTORS[1],
    notes: 'Sags more than the spans either side.',
  },
  {
    near: 10,
    length: 133,
    section: 1,
    found: 1.01,
    method: 'offset-sag',
    conductorTemperature: 28.5,
    inspector: INSPECTORS[1],
  },
  {
    near: 11,
    length: 76,
    section: 1,
    found: 1.18,
    method: 'sight-angle',
    conductorTemperature: 29.0,
    inspector: INSPECTORS[0],
  },
];

/** The two sections: conductor from the library and the design tension at 15.6 °C (60 °F), as strung. */
const SECTIONS: { name: string; conductor: string; designTension: number }[] = [
  { name: 'Str 1 to 7', conductor: 'raven', designTension: 2900 },
  { name: 'Str 7 to 13', conductor: 'penguin', designTension: 5800 },
];

const DESIGN_TEMPERATURE = 15.6;

function round(value: number, step: number): number {
  return Math.round(value / step) * step;
}

/** Tangent sight touching the wire at fraction f of the span: drops below each attachment and the slope. */
function tangentSight(g: SpanGeometry, weight: number, tension: number, fraction: number) {
  const solution = spanAtTension(g, weight, tension);
  const c = solution.catenaryParameter;
  const x = fraction * g.span;
  const slope = Math.sinh((x - solution.lowPointX) / c);
  const atZero = wireElevation(x, c, solution.lowPointX) - slope * x;
  return { nearDrop: -atZero, farDrop: g.rise - (atZero + slope * g.span), slope };
}

/** A reading as the crew would have recorded it, from the wire's true tension. */
function measurementFor(
  method: MethodId,
  g: SpanGeometry,
  weight: number,
  tension: number,
): { m: Measurement; taps?: number[] } {
  const solution = spanAtTension(g, weight, tension);
  const c = solution.catenaryParameter;
  switch (method) {
    case 'midspan-sag':
      return { m: { method, sag: round(solution.midspanSag, 0.01) } };
    case 'offset-sag': {
      const x = round(0.31 * g.span, 1);
      const sag = (g.rise * x) / g.span - wireElevation(x, c, solution.lowPointX);
      return { m: { method, x, sag: round(sag, 0.01) } };
    }
    case 'sight-line': {
      const sight = tangentSight(g, weight, tension, 0.42);
      return { m: { method, nearDrop: round(sight.nearDrop, 0.01), farDrop: round(sight.farDrop, 0.01) } };
    }
    case 'sight-angle': {
      const sight = tangentSight(g, weight, tension, 0.55);
      const degrees = round((Math.atan(sight.slope) * 180) / Math.PI, 0.01);
      return { m: { method, nearDrop: round(sight.nearDrop, 0.01), angle: (degrees * Math.PI) / 180 } };
    }
    case 'return-wave': {
      // Three returns; the tap times carry a small, fixed human scatter (no randomness in the demo).
      const period = solution.returnTime;
      const scatter = [0, 0.04, -0.03, 0.02];
      const taps = scatter.map((offset, index) => round(index * period + offset, 0.01));
      return { m: { method, returns: 3, seconds: round(3 * period, 0.01) }, taps };
    }
    case 'surveyed-points': {
      const points = [0.12, 0.3, 0.5, 0.68, 0.86].map((fraction) => {
        const x = round(fraction * g.span, 0.01);
        return { x, z: round(wireElevation(x, c, solution.lowPointX), 0.005) };
      });
      return { m: { method, points } };
    }
  }
}

/** Builds every record of the demo line (fresh ids each time, so it can be loaded more than once). */
export function buildDemoLine(options: DemoOptions): { lineId: string; records: RecordSet } {
  const nowIso = options.now.toISOString();
  const meta = (): RecordMeta => newRecordMeta(options.deviceId, nowIso, options.newId());
  const line = {
    ...meta(),
    name: 'Kestrel Ridge 12.47 kV feeder',
    unitSystem: 'metric' as const,
    owner: 'Alder Hollow Rural Electric (invented for the demo)',
    notes: 'Demo line: invented names, places and readings.',
  };
  const conductors: Conductor[] = SECTIONS.map((section) => {
    const found = findConductor(section.conductor);
    if (!found) throw new Error(`Demo conductor ${section.conductor} is missing from the library.`);
    return found;
  });
  const sections: SectionRecord[] = SECTIONS.map((section, index) => ({
    ...meta(),
    lineId: line.id,
    name: section.name,
    conductor: conductorSpecFromLibrary(conductors[index]!),
    design: {
      basis: {
        kind: 'tension',
        horizontalTension: section.designTension,
        referenceTemperature: DESIGN_TEMPERATURE,
        state: 'initial',
        creepOffset: 0,
      },
      maxDesignTemperature: 49,
      terrainCategory: 3,
    },
  }));
  const structures: StructureRecord[] = STRUCTURES.map(
    ([label, ground, height, latitude, longitude], index) => ({
      ...meta(),
      lineId: line.id,
      label,
      order: index + 1,
      groundElevation: ground,
      attachmentHeight: height,
      position: { latitude, longitude, accuracy: 4 },
    }),
  );
  const spans: SpanRecord[] = [];
  const wires: WireRecord[] = [];
  const readings: ReadingRecord[] = [];
  const start = options.now.getTime() - 3 * 24 * 3600 * 1000;

  SPANS.forEach((plan, index) => {
    const near = structures[plan.near]!;
    const far = structures[plan.near + 1]!;
    const section = sections[plan.section]!;
    const conductor = conductors[plan.section]!;
    const nearAttachment = (near.groundElevation ?? 0) + (near.attachmentHeight ?? 0);
    const farAttachment = (far.groundElevation ?? 0) + (far.attachmentHeight ?? 0);
    const span: SpanRecord = {
      ...meta(),
      lineId: line.id,
      sectionId: section.id,
      nearStructureId: near.id,
      farStructureId: far.id,
      length: plan.length,
      nearAttachmentElevation: nearAttachment,
      farAttachmentElevation: farAttachment,
      nearGroundElevation: near.groundElevation,
      farGroundElevation: far.groundElevation,
      requiredClearance: 5.6,
      ...(plan.notes ? { notes: plan.notes } : {}),
    };
    spans.push(span);
    const labels: [string, number][] = plan.neutral
      ? [
          ['A', 0],
          ['N', -1.5],
        ]
      : [['A', 0]];
    labels.forEach(([label, offset], wireIndex) => {
      const wire: WireRecord = {
        ...meta(),
        lineId: line.id,
        spanId: span.id,
        label,
        nearOffset: offset,
        farOffset: offset,
      };
      wires.push(wire);
      const g: SpanGeometry = { span: plan.length, rise: farAttachment - nearAttachment };
      const designAtReading = tensionAtState(
        g,
        elasticFromConductor(conductor),
        {
          horizontalTension: SECTIONS[plan.section]!.designTension,
          temperature: DESIGN_TEMPERATURE,
          weight: conductor.weight,
        },
        { temperature: plan.conductorTemperature, weight: conductor.weight },
      );
      const method: MethodId = wireIndex === 0 ? plan.method : 'midspan-sag';
      // The neutral hangs a little slacker than the phase above it, as neutrals often do.
      const found = wireIndex === 0 ? plan.found : plan.found * 0.96;
      const { m, taps } = measurementFor(method, g, conductor.weight, designAtReading * found);
      readings.push({
        ...meta(),
        lineId: line.id,
        spanId: span.id,
        wireId: wire.id,
        measurement: m,
        ...(taps ? { taps } : {}),
        conductorTemperature: plan.conductorTemperature,
        ambientTemperature: plan.conductorTemperature - 4,
        takenAt: new Date(start + index * 40 * 60 * 1000 + wireIndex * 6 * 60 * 1000).toISOString(),
        location: near.position,
        inspector: plan.inspector,
        ...(wireIndex === 0 && plan.notes ? { notes: plan.notes } : {}),
      });
    });
  });

  return {
    lineId: line.id,
    records: {
      line: [line],
      section: sections,
      structure: structures,
      span: spans,
      wire: wires,
      reading: readings,
    },
  };
}
