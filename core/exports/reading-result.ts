/**
 * The exports' result function built from stored records: each reading is solved on the exact catenary and,
 * when its tension section has a design, judged by the assessment (core/assess). Pass the returned function as
 * `resultFor` of the inspection log, the GeoJSON and the printed report.
 */
import { assessReading } from '../assess/assess-reading';
import { knownUncertainties } from '../assess/reading-inputs';
import type { AssessSettings, ClearanceSite, SectionDesignInput } from '../assess/types';
import { SpanInputError } from '../errors';
import type { SectionRecord } from '../records/section';
import type { SpanRecord } from '../records/span';
import type { WireRecord } from '../records/wire';
import { solveSpan } from '../solve';
import type { SpanGeometry } from '../types';
import { readingResultFromAssessment } from './assessment-result';
import type { InspectionLogInput, ReadingContext, ReadingResult } from './inspection-log';

/** Geometry of one wire: the span's attachment elevations plus the wire's own offsets. */
function wireGeometry(span: SpanRecord, wire: WireRecord): { geometry: SpanGeometry; nearElevation: number } {
  const nearElevation = span.nearAttachmentElevation + wire.nearOffset;
  const farElevation = span.farAttachmentElevation + wire.farOffset;
  return { geometry: { span: span.length, rise: farElevation - nearElevation }, nearElevation };
}

/** The ground under a span for the clearance check, or undefined when no ground elevation is known. */
function clearanceSite(span: SpanRecord, nearElevation: number): ClearanceSite | undefined {
  const groundPoints: { x: number; elevation: number }[] = [];
  if (span.nearGroundElevation !== undefined)
    groundPoints.push({ x: 0, elevation: span.nearGroundElevation });
  for (const point of span.groundPoints ?? []) groundPoints.push({ x: point.x, elevation: point.elevation });
  if (span.farGroundElevation !== undefined)
    groundPoints.push({ x: span.length, elevation: span.farGroundElevation });
  if (groundPoints.length === 0) return undefined;
  groundPoints.sort((a, b) => a.x - b.x);
  return {
    nearAttachmentElevation: nearElevation,
    groundPoints,
    ...(span.requiredClearance === undefined ? {} : { requiredClearance: span.requiredClearance }),
  };
}

/** The assessment's view of a section with a design, or undefined without one. */
function sectionDesignInput(
  section: SectionRecord,
  spans: readonly SpanRecord[],
): SectionDesignInput | undefined {
  const design = section.design;
  if (!design) return undefined;
  const { conductor } = section;
  return {
    conductor: {
      weight: conductor.weight,
      ratedStrength: conductor.ratedStrength,
      area: conductor.area,
      modulus: conductor.modulus,
      expansion: conductor.expansion,
      diameter: conductor.diameter,
      ...(conductor.composite ? { composite: conductor.composite } : {}),
    },
    basis: design.basis,
    spanLengths: spans
      .filter((span) => span.sectionId === section.id && !span.deleted)
      .map((span) => span.length),
    ...(design.rulingSpanOverride === undefined ? {} : { rulingSpanOverride: design.rulingSpanOverride }),
    maxDesignTemperature: design.maxDesignTemperature,
    terrainCategory: design.terrainCategory,
  };
}

/**
 * A result function for the exports. Readings of a section with a design get the full assessment (verdict,
 * design sag, deviation, % of rated strength, clearance margin); others get the solved tension, sag and % of
 * rated strength only. A reading that cannot be solved gets the solver's message as `error`.
 * @param input the line's records (sections and spans give the design and the ruling span)
 * @param settings project settings of the checks (defaults of core/assess when absent); the section's own
 *   tolerance, when set, overrides the project's
 */
export function readingResultFunction(
  input: Omit<InspectionLogInput, 'resultFor'>,
  settings: AssessSettings = {},
): (context: ReadingContext) => ReadingResult {
  const designs = new Map<string, SectionDesignInput | undefined>();
  return (context) => {
    const { section, span, wire, reading } = context;
    if (!section)
      return { error: 'The tension section of this span is missing, so its conductor is unknown.' };
    const { geometry, nearElevation } = wireGeometry(span, wire);
    try {
      if (!designs.has(section.id)) designs.set(section.id, sectionDesignInput(section, input.spans));
      const design = designs.get(section.id);
      if (!design) {
        const solution = solveSpan(geometry, section.conductor.weight, reading.measurement);
        const support = Math.max(solution.nearSupportTension, solution.farSupportTension);
        return {
          horizontalTension: solution.horizontalTension,
          sag: solution.midspanSag,
          percentOfRatedStrength: (100 * support) / section.conductor.ratedStrength,
        };
      }
      const site = clearanceSite(span, nearElevation);
      const uncertainty = knownUncertainties(reading.uncertainty);
      const tolerance = section.design?.tolerance ?? settings.tolerance;
      const assessment = assessReading(
        design,
        {
          geometry,
          measurement: reading.measurement,
          conductorTemperature: reading.conductorTemperature,
          id: reading.id,
          ...(site ? { site } : {}),
          ...(uncertainty ? { uncertainty } : {}),
        },
        { ...settings, ...(tolerance ? { tolerance } : {}) },
      );
      return readingResultFromAssessment(assessment);
    } catch (error) {
      if (error instanceof SpanInputError) return { error: error.message, errorCode: error.code };
      throw error;
    }
  };
}
