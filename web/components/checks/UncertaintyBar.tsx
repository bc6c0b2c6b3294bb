// The sag deviation's 95 % band drawn against the tolerance: a horizontal scale from "tighter" to "slacker" with
// the tolerance limits marked, the band as a thick bar and the best estimate as a dot. Words below say the same.
import type { VerdictResult } from '../../../core/assess/types';
import type { UnitSystem } from '../../../core/units';
import { bandText, quantityText, signedText } from '../../judgement/verdict-words';

const WIDTH = 340;
const HEIGHT = 96;
const LEFT = 16;
const RIGHT = WIDTH - 16;
const AXIS_Y = 46;
/** Room beyond the widest thing drawn, as a fraction of it. */
const ROOM = 0.15;

export function UncertaintyBar({ verdict, units }: { verdict: VerdictResult; units: UnitSystem }) {
  const a = verdict.allowance;
  const { low, high, value } = verdict.band;
  const bandKnown = Number.isFinite(low) && Number.isFinite(high);
  const reach = Math.max(a * 1.5, Math.abs(value), bandKnown ? Math.max(Math.abs(low), Math.abs(high)) : 0);
  const half = reach * (1 + ROOM) || 1;
  const x = (deviation: number): number =>
    LEFT + ((Math.max(-half, Math.min(half, deviation)) + half) / (2 * half)) * (RIGHT - LEFT);
  const band = bandText(low, high, 'sag', units);
  const summary =
    `Deviation ${signedText(value, 'sag', units)}` +
    (band ? `, ${band}` : ', band unknown') +
    `; tolerance ±${quantityText(a, 'sag', units)}.`;
  return (
    <figure class="uncertainty-bar">
      <svg
        viewBox={`0 0 ${WIDTH} ${HEIGHT}`}
        width="100%"
        role="img"
        aria-label={`Sag deviation against the tolerance. ${summary}`}
      >
        {/* Tolerance zone */}
        <rect
          x={x(-a)}
          y={AXIS_Y - 18}
          width={Math.max(0, x(a) - x(-a))}
          height={36}
          fill="#dcefe2"
          stroke="#14532d"
          stroke-width="1.5"
        />
        <line x1={LEFT} y1={AXIS_Y} x2={RIGHT} y2={AXIS_Y} stroke="#111417" stroke-width="2" />
        {/* Design (zero deviation) */}
        <line x1={x(0)} y1={AXIS_Y - 22} x2={x(0)} y2={AXIS_Y + 22} stroke="#111417" stroke-width="2" />
        {/* Tolerance limits, labelled outside the zone so the two labels never meet */}
        {[-a, a].map((limit) => (
          <g key={limit}>
            <line
              class="uncertainty-bar__limit"
              x1={x(limit)}
              y1={AXIS_Y - 26}
              x2={x(limit)}
              y2={AXIS_Y + 26}
              stroke="#14532d"
              stroke-width="3"
            />
            <text
              x={x(limit) + (limit < 0 ? -5 : 5)}
              y={HEIGHT - 6}
              text-anchor={limit < 0 ? 'end' : 'start'}
              font-size="15"
              font-weight="700"
              fill="#111417"
            >
              {signedText(limit, 'sag', units)}
            </text>
          </g>
        ))}
        {/* 95 % band and best estimate */}
        {bandKnown && (
          <rect
            class="uncertainty-bar__band"
            x={x(low)}
            y={AXIS_Y - 7}
            width={Math.max(2, x(high) - x(low))}
            height={14}
            fill="#0b4f6c"
            opacity="0.85"
          />
        )}
        {Number.isFinite(value) && (
          <circle
            class="uncertainty-bar__value"
            cx={x(value)}
            cy={AXIS_Y}
            r="8"
            fill="#ffffff"
            stroke="#111417"
            stroke-width="3"
          />
        )}
        <text x={LEFT} y={14} font-size="15" font-weight="700" fill="#3b4248">
          ← tighter
        </text>
        <text x={RIGHT} y={14} font-size="15" font-weight="700" fill="#3b4248" text-anchor="end">
          slacker →
        </text>
        <text x={x(0)} y={14} font-size="15" font-weight="700" fill="#111417" text-anchor="middle">
          design
        </text>
      </svg>
      <figcaption class="uncertainty-bar__caption">{summary}</figcaption>
    </figure>
  );
}
