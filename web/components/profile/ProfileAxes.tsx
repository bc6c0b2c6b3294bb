// Tick marks, axis captions and the vertical-scale note of the span profile, in the line's length unit.
import { lengthFromDisplay, lengthToDisplay, lengthUnit, type UnitSystem } from './display-units';
import { niceStep, ticksBetween, type ProfileLayout } from './profile-layout';
import { PROFILE_INK } from './profile-styles';

interface ProfileAxesProps {
  layout: ProfileLayout;
  span: number;
  /** Near attachment elevation in the ground datum, m (0 when heights are relative to it). */
  datum: number;
  /** True when elevations are absolute (a datum was given), false for heights above the near attachment. */
  absolute: boolean;
  unitSystem: UnitSystem;
  verticalNote: string;
}

/** Decimals that show a tick step exactly (0 for steps of 1 or more, at most 3). */
function decimalsFor(step: number): number {
  return step >= 1 ? 0 : Math.min(3, Math.ceil(-Math.log10(step)));
}

export function ProfileAxes({ layout, span, datum, absolute, unitSystem, verticalNote }: ProfileAxesProps) {
  const { viewX, viewY, plot, box, world } = layout;
  const xTickStep = niceStep(
    lengthToDisplay(span, unitSystem),
    Math.max(3, Math.floor((plot.right - plot.left) / 110)),
  );
  const xTicks = ticksBetween(0, lengthToDisplay(span, unitSystem), xTickStep);
  const zLowDisplay = lengthToDisplay(layout.worldZ(plot.bottom) + datum, unitSystem);
  const zHighDisplay = lengthToDisplay(world.zMax + datum, unitSystem);
  const zTickStep = niceStep(zHighDisplay - zLowDisplay, 4);
  const zTicks = ticksBetween(zLowDisplay, zHighDisplay, zTickStep).filter((t) => {
    const y = viewY(lengthFromDisplay(t, unitSystem) - datum);
    return y >= plot.top && y <= plot.bottom;
  });
  const unit = lengthUnit(unitSystem);
  return (
    <g class="span-profile__axes" fill={PROFILE_INK.softInk}>
      <line
        x1={plot.left}
        y1={plot.bottom}
        x2={plot.right}
        y2={plot.bottom}
        stroke={PROFILE_INK.faintInk}
        stroke-width="1"
      />
      {xTicks.map((t) => {
        const x = viewX(lengthFromDisplay(t, unitSystem));
        return (
          <g key={`x${t}`}>
            <line x1={x} y1={plot.bottom} x2={x} y2={plot.bottom + 6} stroke={PROFILE_INK.softInk} />
            <text x={x} y={plot.bottom + 22} text-anchor="middle" class="span-profile__tick">
              {t.toFixed(decimalsFor(xTickStep))}
            </text>
          </g>
        );
      })}
      <text x={plot.right} y={box.height - 8} text-anchor="end" class="span-profile__caption">
        distance from near support ({unit})
      </text>
      {zTicks.map((t) => {
        const y = viewY(lengthFromDisplay(t, unitSystem) - datum);
        return (
          <g key={`z${t}`}>
            <line x1={plot.left - 6} y1={y} x2={plot.left} y2={y} stroke={PROFILE_INK.softInk} />
            <text x={plot.left - 9} y={y + 5} text-anchor="end" class="span-profile__tick">
              {t.toFixed(decimalsFor(zTickStep)).replace('-', '−')}
            </text>
          </g>
        );
      })}
      <text x="8" y="44" class="span-profile__caption">
        {absolute ? 'elevation' : 'height above near attachment'} ({unit})
      </text>
      <text
        x={box.width - 8}
        y="22"
        text-anchor="end"
        class="span-profile__scale-note"
        fill={PROFILE_INK.ink}
      >
        {verticalNote}
      </text>
    </g>
  );
}
