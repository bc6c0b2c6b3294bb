// The main wire's lowest point: a marker on the wire, or an arrow and words at the support it lies beyond.
import { formatLength, type UnitSystem } from './display-units';
import { curveElevation, type ProfileCurve } from './profile-curves';
import type { ProfileLayout } from './profile-layout';
import { PROFILE_INK } from './profile-styles';
import { HALO, POLE_WIDTH } from './svg-parts';

/** Where the low point lies relative to the span. */
export type LowPointSide = 'inside' | 'near' | 'far';

interface LowPointMarkerProps {
  layout: ProfileLayout;
  span: number;
  rise: number;
  main: ProfileCurve;
  lowX: number;
  lowSide: LowPointSide;
  /** id of the arrowhead marker defined in the drawing. */
  arrowId: string;
  unitSystem: UnitSystem;
}

export function LowPointMarker({
  layout,
  span,
  rise,
  main,
  lowX,
  lowSide,
  arrowId,
  unitSystem,
}: LowPointMarkerProps) {
  const { viewX, viewY } = layout;
  return (
    <>
      {lowSide === 'inside' && (
        <g class="span-profile__low-point" data-low-point="inside">
          <path
            d={(() => {
              const x = viewX(lowX);
              const y = viewY(curveElevation(span, rise, main, lowX)) + 5;
              return `M${x} ${y} L${x - 8} ${y + 13} L${x + 8} ${y + 13} Z`;
            })()}
            fill={PROFILE_INK.accent}
            stroke={PROFILE_INK.ink}
            stroke-width="1.5"
          />
          <text
            x={viewX(lowX)}
            y={viewY(curveElevation(span, rise, main, lowX)) + 36}
            text-anchor="middle"
            class="span-profile__small"
            fill={PROFILE_INK.ink}
            {...HALO}
          >
            low point
          </text>
        </g>
      )}
      {(lowSide === 'near' || lowSide === 'far') && (
        <g class="span-profile__low-point" data-low-point={`beyond-${lowSide}`}>
          {(() => {
            const near = lowSide === 'near';
            const xSupport = viewX(near ? 0 : span);
            const y = viewY(near ? 0 : rise) + 24;
            const away = near ? -1 : 1;
            const textX = xSupport - away * (POLE_WIDTH / 2 + 6);
            const anchor = near ? 'start' : 'end';
            return (
              <>
                <line
                  x1={xSupport - away * 56}
                  y1={y}
                  x2={xSupport + away * (POLE_WIDTH / 2 + 22)}
                  y2={y}
                  stroke={PROFILE_INK.accent}
                  stroke-width="4"
                  marker-end={`url(#${arrowId})`}
                />
                <text
                  x={textX}
                  y={y + 24}
                  text-anchor={anchor}
                  class="span-profile__label"
                  fill={PROFILE_INK.ink}
                  {...HALO}
                >
                  <tspan x={textX}>low point beyond </tspan>
                  <tspan x={textX} dy="20">
                    {near ? 'near' : 'far'} support
                  </tspan>
                </text>
                <text
                  x={textX}
                  y={y + 62}
                  text-anchor={anchor}
                  class="span-profile__small"
                  fill={PROFILE_INK.softInk}
                  {...HALO}
                >
                  {near
                    ? `${formatLength(-lowX, unitSystem, 1)} before it`
                    : `${formatLength(lowX - span, unitSystem, 1)} past it`}
                </text>
              </>
            );
          })()}
        </g>
      )}
    </>
  );
}
