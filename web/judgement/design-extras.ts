// Reading the judgement's extra design settings (compared condition, vibration-check temperature, loaded
// condition, section-wide uncertainties, a table's creep allowance) off a stored section design; the schemas
// live with the records in core/records/design.ts. Absent fields mean the defaults of core/assess/defaults.
import type { LoadedCondition, WireState } from '../../core/assess/types';
import { conductorLoad } from '../../core/loads';
import type { ConductorSpec } from '../../core/records/conductor';
import {
  designExtrasSchema,
  UNCERTAINTY_NAMES,
  type DesignExtras,
  type SectionDesign,
} from '../../core/records/design';

export { designExtrasSchema, UNCERTAINTY_NAMES, type DesignExtras };
export type { UncertaintyName } from '../../core/records/design';

/** A section design; the extras are part of the stored schema. */
export type JudgementDesign = SectionDesign;

/** The extras of a stored design (already validated by the records schema). */
export function designExtrasOf(design: SectionDesign): DesignExtras {
  const { compareState, vibrationTemperature, loading, uncertainty } = design;
  return { compareState, vibrationTemperature, loading, uncertainty };
}

/** A table basis' creep allowance, °C, when the stored design carries one (core uses its default otherwise). */
export function tableCreepOffsetOf(design: SectionDesign): number | undefined {
  return design.basis.kind === 'table' ? design.basis.creepOffset : undefined;
}

/** The compared condition, defaulting as core does. */
export function compareStateOf(extras: DesignExtras): WireState {
  return extras.compareState ?? 'initial';
}

/**
 * The loaded condition for the tension limits: resultant weight of bare conductor + radial ice, with wind on the
 * iced diameter (core/loads conductorLoad). Undefined without a loading or without a conductor diameter.
 */
export function loadedConditionFor(
  extras: DesignExtras,
  conductor: ConductorSpec,
): LoadedCondition | undefined {
  const loading = extras.loading;
  if (!loading) return undefined;
  const load = conductorLoad({
    bareWeight: conductor.weight,
    diameter: conductor.diameter,
    iceThickness: loading.iceThickness,
    windPressure: loading.windPressure,
  });
  return { label: loading.label, temperature: loading.temperature, weight: load.resultant };
}
