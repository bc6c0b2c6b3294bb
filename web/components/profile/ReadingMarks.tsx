// Sag readings (a bracket from chord to wire with its value) and surveyed points (hollow squares).
import type { ProfileMark } from './SpanProfile';
import { formatLength, type UnitSystem } from './display-units';
import type { ProfileLayout } from './profile-layout';
import { PROFILE_INK } from './profile-styles';
import { HALO, LABEL_CHAR_WIDTH } from './svg-parts';

interface ReadingMarksProps {
  layout: ProfileLayout;
  span: number;
  rise: number;
  marks: ProfileMark[];
  unitSystem: UnitSystem;
}

export function ReadingMarks({ layout, span, rise, marks, unitSystem }: ReadingMarksProps) {
  const { viewX, viewY, box } = layout;
  return (
    <>
      {marks.map((m, k) => {
        if (m.kind === 'sag-reading') {
          const xv = viewX(m.x) - 14;
          const text = `${m.label ?? 'reading'} ${formatLength(m.sag, unitSystem)}`;
          // Written above the chord, clear of the sag label beside the dimension line, kept inside the box.
          const half = (text.length * LABEL_CHAR_WIDTH) / 2;
          const labelX = Math.min(Math.max(xv, half + 4), box.width - half - 4);
          const top = viewY((rise * m.x) / span);
          const bottom = viewY((rise * m.x) / span - m.sag);
          return (
            <g key={`mark${k}`} class="span-profile__reading" stroke={PROFILE_INK.ink} stroke-width="2">
              <line x1={xv} y1={top} x2={xv} y2={bottom} />
              <line x1={xv - 6} y1={top} x2={xv + 6} y2={top} />
              <line x1={xv - 6} y1={bottom} x2={xv + 6} y2={bottom} />
              <text
                x={labelX}
                y={top - 12}
                text-anchor="middle"
                class="span-profile__label"
                fill={PROFILE_INK.ink}
                {...HALO}
              >
                {text}
              </text>
            </g>
          );
        }
        if (m.kind === 'point') {
          return (
            <g key={`mark${k}`} class="span-profile__point">
              <rect
                x={viewX(m.x) - 5}
                y={viewY(m.z) - 5}
                width="10"
                height="10"
                fill={PROFILE_INK.paper}
                stroke={PROFILE_INK.ink}
                stroke-width="2"
              />
              {m.label !== undefined && (
                <text
                  x={viewX(m.x) + 8}
                  y={viewY(m.z) - 8}
                  class="span-profile__small"
                  fill={PROFILE_INK.ink}
                  {...HALO}
                >
                  {m.label}
                </text>
              )}
            </g>
          );
        }
        return null;
      })}
    </>
  );
}
