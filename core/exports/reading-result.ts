/**
 * The exports' result function built from stored records: each reading is solved on the exact catenary and,
 * when its tension section has a design, judged by the assessment (core/assess). Pass the returned function as
 * `resultFor` of the inspection log, the GeoJSON and the printed report.
 */
import { assessReading } from '../assess/assess-reading';
import { knownUncertainties } from '../assess/reading-inputs';
import type { AssessSettings, SectionDesignInput } from '../assess/types';
import { SpanInputError } from '../errors';
import type { SectionRecord } from '../records/section';
import type { SpanRecord } from '../records/span';
import { clearanceSiteFor, wireGeometry } from '../records/wire-site';
import { solveSpan } from '../solve';
import { readingResultFromAssessment } from './assessment-result';
import type { InspectionLogInput, ReadingContext, ReadingResult } from './inspection-log';

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
    const { geometry } = wireGeometry(span, wire);
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
      const site = clearanceSiteFor(span, wire);
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
