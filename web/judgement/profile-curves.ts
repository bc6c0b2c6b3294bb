// The span drawing of a judged reading: measured wire, design wire at the same temperature and the hot-day wire,
// with the ground and the required clearance, as props for web/components/profile SpanProfile.
import type { ReadingAssessment, ReadingInput } from '../../core/assess/types';
import { formatQuantity, type UnitSystem } from '../../core/units';
import type { SpanProfileProps } from '../components/profile';
import type { ProfileCurve } from '../components/profile';

function temperatureText(celsius: number, units: UnitSystem): string {
  const { value, unit } = formatQuantity(celsius, 'temperature', units);
  return `${value} ${unit}`;
}

/**
 * SpanProfile props for a judged reading (everything but readings, title and layoutWidth).
 * Catenary parameters are C = H/w with the weight the reading was solved with (w = H/C of the measured wire).
 * The hot-day wire is included only when the reading has a ground profile (it comes with the clearance check).
 */
export function profileCurvesFor(
  assessment: ReadingAssessment,
  input: ReadingInput,
  units: UnitSystem,
): Omit<SpanProfileProps, 'readings' | 'title' | 'layoutWidth'> {
  const measured = assessment.measured;
  const weight = measured.horizontalTension / measured.catenaryParameter;
  const at = temperatureText(assessment.temperature, units);
  const curves: ProfileCurve[] = [
    { label: `measured, ${at}`, catenaryParameter: measured.catenaryParameter, style: 'measured' },
    {
      label: `design, ${at}`,
      catenaryParameter: assessment.design.horizontalTension / weight,
      style: 'design',
    },
  ];
  const clearance = assessment.clearance;
  if (clearance) {
    curves.push({
      label: `hot day, ${temperatureText(clearance.temperature, units)} (projected)`,
      catenaryParameter: clearance.horizontalTension / weight,
      style: 'hot',
    });
  }
  const props: Omit<SpanProfileProps, 'readings' | 'title' | 'layoutWidth'> = {
    span: input.geometry.span,
    rise: input.geometry.rise,
    curves,
    lowPointX: measured.lowPointX,
    unitSystem: units,
  };
  const site = input.site;
  if (site) {
    props.nearAttachmentElevation = site.nearAttachmentElevation;
    props.ground = site.groundPoints.map((point) => ({ ...point }));
    if (site.requiredClearance !== undefined) props.requiredClearance = site.requiredClearance;
  }
  return props;
}
