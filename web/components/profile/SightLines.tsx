// Instrument sight lines drawn over the span: target to target, or from the instrument at its angle.
import type { ProfileMark } from './SpanProfile';
import type { ProfileLayout } from './profile-layout';
import { PROFILE_INK, SIGHT_STROKE } from './profile-styles';
import { pathThrough, strokeProps } from './svg-parts';

interface SightLinesProps {
  layout: ProfileLayout;
  span: number;
  rise: number;
  marks: ProfileMark[];
}

export function SightLines({ layout, span, rise, marks }: SightLinesProps) {
  const { viewX, viewY } = layout;
  return (
    <>
      {marks.map((m, k) => {
        if (m.kind === 'sight-line') {
          return (
            <g key={`sight${k}`} class="span-profile__sight">
              <path
                d={pathThrough(
                  [
                    { x: 0, z: -m.nearDrop },
                    { x: span, z: rise - m.farDrop },
                  ],
                  layout,
                )}
                {...strokeProps(SIGHT_STROKE)}
              />
              {[
                { x: 0, z: -m.nearDrop },
                { x: span, z: rise - m.farDrop },
              ].map((p, j) => (
                <rect
                  key={j}
                  x={viewX(p.x) - 9}
                  y={viewY(p.z) - 3}
                  width="18"
                  height="6"
                  fill={PROFILE_INK.paper}
                  stroke={PROFILE_INK.ink}
                  stroke-width="2"
                />
              ))}
            </g>
          );
        }
        if (m.kind === 'sight-angle') {
          const farZ = -m.nearDrop + span * Math.tan(m.angle);
          return (
            <g key={`sight${k}`} class="span-profile__sight">
              <path
                d={pathThrough(
                  [
                    { x: 0, z: -m.nearDrop },
                    { x: span, z: farZ },
                  ],
                  layout,
                )}
                {...strokeProps(SIGHT_STROKE)}
              />
              {/* Instrument: a tripod-like triangle under the sight, unlike the round attachments. */}
              <path
                d={`M${viewX(0)} ${viewY(-m.nearDrop)} l-8 14 l16 0 Z`}
                fill={PROFILE_INK.paper}
                stroke={PROFILE_INK.ink}
                stroke-width="2"
              />
            </g>
          );
        }
        return null;
      })}
    </>
  );
}
