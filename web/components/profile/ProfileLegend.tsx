// The drawing's legend in words, each entry with a sample of its line or symbol (colour is never the only cue).
import { formatLength, type UnitSystem } from './display-units';
import type { ProfileCurve } from './profile-curves';
import {
  CHORD_STROKE,
  CLEARANCE_STROKE,
  CURVE_STROKES,
  GROUND_STROKE,
  SIGHT_STROKE,
  type StrokeStyle,
} from './profile-styles';
import { strokeProps } from './svg-parts';

interface ProfileLegendProps {
  curves: ProfileCurve[];
  hasGround: boolean;
  clearance: number | undefined;
  hasSight: boolean;
  hasReadings: boolean;
  hasPoints: boolean;
  /** Label of the wire whose low point is marked on it; undefined when no marker is drawn. */
  lowPointOf: string | undefined;
  unitSystem: UnitSystem;
}

function LineSample({ style }: { style: StrokeStyle }) {
  return (
    <svg class="span-profile__sample" viewBox="0 0 48 14" aria-hidden="true">
      <line x1="2" y1="7" x2="46" y2="7" {...strokeProps(style)} />
    </svg>
  );
}

export function ProfileLegend(props: ProfileLegendProps) {
  const { curves, hasGround, clearance, hasSight, hasReadings, hasPoints, lowPointOf, unitSystem } = props;
  return (
    <figcaption>
      <ul class="span-profile__legend">
        {curves.map((c, k) => (
          <li key={`legend${k}`}>
            <LineSample style={CURVE_STROKES[c.style]} />
            <span>{c.label}</span>
          </li>
        ))}
        <li>
          <LineSample style={CHORD_STROKE} />
          <span>chord (straight line between attachments)</span>
        </li>
        {hasGround && (
          <li>
            <LineSample style={GROUND_STROKE} />
            <span>ground</span>
          </li>
        )}
        {clearance !== undefined && (
          <li>
            <LineSample style={CLEARANCE_STROKE} />
            <span>required clearance ({formatLength(clearance, unitSystem)} over ground)</span>
          </li>
        )}
        {hasSight && (
          <li>
            <LineSample style={SIGHT_STROKE} />
            <span>sight line</span>
          </li>
        )}
        {hasReadings && (
          <li>
            <span class="span-profile__symbol" aria-hidden="true">
              ⊥
            </span>
            <span>sag reading</span>
          </li>
        )}
        {hasPoints && (
          <li>
            <span class="span-profile__symbol" aria-hidden="true">
              □
            </span>
            <span>surveyed point</span>
          </li>
        )}
        {lowPointOf !== undefined && (
          <li>
            <span class="span-profile__symbol span-profile__symbol--accent" aria-hidden="true">
              ▲
            </span>
            <span>low point ({lowPointOf})</span>
          </li>
        )}
      </ul>
    </figcaption>
  );
}
