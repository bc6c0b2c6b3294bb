import { useId, useLayoutEffect, useRef, useState } from 'preact/hooks';
import { lowPointX as coreLowPointX } from '../../../core/catenary';
import { formatLength, type UnitSystem } from './display-units';
import { LowPointMarker, type LowPointSide } from './LowPointMarker';
import { ProfileAxes } from './ProfileAxes';
import { ProfileLegend } from './ProfileLegend';
import { ReadingMarks } from './ReadingMarks';
import { SightLines } from './SightLines';
import { curveElevation, curveSagAt, isDrawable, sampleCurve, type ProfileCurve } from './profile-curves';
import { layoutProfileWithRoom, type WorldBounds } from './profile-layout';
import { CHORD_STROKE, CLEARANCE_STROKE, CURVE_STROKES, GROUND_STROKE, PROFILE_INK } from './profile-styles';
import { HALO, LABEL_CHAR_WIDTH, POLE_WIDTH, pathThrough, strokeProps } from './svg-parts';
import './SpanProfile.css';

/** Something measured on the span, drawn over the wires. All lengths m, relative to the near attachment. */
export type ProfileMark =
  /** A chord-to-wire reading taken at x. */
  | { kind: 'sag-reading'; x: number; sag: number; label?: string }
  /** A surveyed point on the wire. */
  | { kind: 'point'; x: number; z: number; label?: string }
  /** Sight line from a target nearDrop below the near attachment to one farDrop below the far attachment. */
  | { kind: 'sight-line'; nearDrop: number; farDrop: number }
  /** Sight from an instrument nearDrop below the near attachment at `angle` rad above horizontal. */
  | { kind: 'sight-angle'; nearDrop: number; angle: number };

/** Ground surface point: x m from the near support, elevation m in the datum of nearAttachmentElevation. */
export interface GroundPoint {
  x: number;
  elevation: number;
}

export interface SpanProfileProps {
  /** Horizontal distance between attachments, m (> 0). */
  span: number;
  /** Far attachment elevation minus near attachment elevation, m. */
  rise: number;
  /** Elevation of the near attachment in the ground datum, m; 0 (ground given relative to it) when absent. */
  nearAttachmentElevation?: number;
  /** Wires to draw; the first 'measured' one (else the first) gets the sag dimension and the low point. */
  curves: ProfileCurve[];
  readings?: ProfileMark[];
  /** Low point of the main wire, m from the near support; computed with core when absent. */
  lowPointX?: number;
  ground?: GroundPoint[];
  /** Required clearance above ground, m; drawn as a line over the ground when ground is given. */
  requiredClearance?: number;
  unitSystem: UnitSystem;
  /** Accessible title; "Span profile" when absent. */
  title?: string;
  /** Drawing width in user units; when absent the drawing follows its container's width (text stays true size). */
  layoutWidth?: number;
}

const DEFAULT_WIDTH = 720;
const MIN_WIDTH = 320;
const MAX_WIDTH = 1100;
/** Room left and right of the supports, as a fraction of the span, for poles and "beyond" arrows. */
const SIDE_ROOM = 0.07;
/** Room above and below the drawn things, as a fraction of their vertical extent. */
const VERTICAL_ROOM = 0.1;
const POLE_TOP_ABOVE_ATTACHMENT = 14;
/** Free height under the low point marker for its label, user units. */
const LOW_POINT_LABEL_ROOM = 46;
/** Free height under a support for the three lines of "low point beyond …", user units. */
const BEYOND_LABEL_ROOM = 100;

function heightFor(width: number): number {
  // Phones get a nearly square drawing, wide screens a landscape one: sag needs height to be seen.
  return Math.round(Math.min(540, Math.max(340, width * 0.6)));
}

/** Follows the container's width so labels keep their true pixel size on a phone and on a desktop. */
function useLayoutWidth(fixed: number | undefined): [(el: HTMLElement | null) => void, number] {
  const [width, setWidth] = useState(fixed ?? DEFAULT_WIDTH);
  const elementRef = useRef<HTMLElement | null>(null);
  useLayoutEffect(() => {
    const element = elementRef.current;
    if (fixed !== undefined || !element || typeof ResizeObserver === 'undefined') return undefined;
    const update = (): void => {
      const measured = element.clientWidth;
      if (measured > 0) setWidth(Math.min(MAX_WIDTH, Math.max(MIN_WIDTH, Math.round(measured / 10) * 10)));
    };
    update();
    const observer = new ResizeObserver(update);
    observer.observe(element);
    return () => observer.disconnect();
  }, [fixed]);
  return [(el) => (elementRef.current = el), fixed ?? width];
}

function groundInterpolated(ground: GroundPoint[], x: number, datum: number): number | undefined {
  const first = ground[0];
  const last = ground[ground.length - 1];
  if (!first || !last) return undefined;
  if (x <= first.x) return first.elevation - datum;
  if (x >= last.x) return last.elevation - datum;
  for (let k = 1; k < ground.length; k += 1) {
    const a = ground[k - 1];
    const b = ground[k];
    if (a && b && x <= b.x) {
      const t = b.x === a.x ? 0 : (x - a.x) / (b.x - a.x);
      return a.elevation + t * (b.elevation - a.elevation) - datum;
    }
  }
  return undefined;
}

/**
 * Side view of one span: supports, chord, wires, sag dimension, low point, readings, ground and clearance.
 * Geometry comes from core (sampled for drawing only); every length label goes through the unit formatter.
 */
export function SpanProfile(props: SpanProfileProps) {
  const { span, rise, unitSystem } = props;
  const baseId = useId();
  const [containerRef, width] = useLayoutWidth(props.layoutWidth);
  const titleText = props.title ?? 'Span profile';

  if (!(Number.isFinite(span) && span > 0 && Number.isFinite(rise))) {
    return (
      <div class="span-profile span-profile--empty" role="note">
        No drawing yet: the span length and attachment heights are needed.
      </div>
    );
  }

  const datum = props.nearAttachmentElevation ?? 0;
  const ground = [...(props.ground ?? [])]
    .filter((p) => Number.isFinite(p.x) && Number.isFinite(p.elevation))
    .sort((a, b) => a.x - b.x);
  const clearance =
    props.requiredClearance !== undefined && Number.isFinite(props.requiredClearance) && ground.length > 0
      ? props.requiredClearance
      : undefined;
  const curves = props.curves.filter(isDrawable);
  const sampled = curves.map((c) => sampleCurve(span, rise, c));
  const main = curves.find((c) => c.style === 'measured') ?? curves[0];
  const marks = props.readings ?? [];

  // World window: everything drawn, plus room for poles and labels.
  const xMin = -SIDE_ROOM * span;
  const xMax = (1 + SIDE_ROOM) * span;
  const zs: number[] = [0, rise];
  for (const s of sampled) for (const p of s.points) zs.push(p.z);
  for (const m of marks) {
    if (m.kind === 'point') zs.push(m.z);
    if (m.kind === 'sag-reading') zs.push((rise * m.x) / span - m.sag);
    if (m.kind === 'sight-line') zs.push(-m.nearDrop, rise - m.farDrop);
    if (m.kind === 'sight-angle') zs.push(-m.nearDrop);
  }
  const visibleGround = ground.filter((p) => p.x >= xMin && p.x <= xMax);
  for (const x of [0, span]) {
    const g = groundInterpolated(ground, x, datum);
    if (g !== undefined) zs.push(g);
  }
  for (const p of visibleGround) {
    zs.push(p.elevation - datum);
    if (clearance !== undefined) zs.push(p.elevation - datum + clearance);
  }
  const finiteZ = zs.filter(Number.isFinite);
  const zLow = Math.min(...finiteZ);
  const zHigh = Math.max(...finiteZ);
  const room = Math.max(zHigh - zLow, span * 1e-3) * VERTICAL_ROOM;
  const world: WorldBounds = { xMin, xMax, zMin: zLow - room, zMax: zHigh + room };
  const box = { width, height: heightFor(width) };

  // Main wire's sag and low point.
  const midSag = main ? curveSagAt(span, rise, main, span / 2) : undefined;
  const lowX = main ? (props.lowPointX ?? coreLowPointX(span, rise, main.catenaryParameter)) : undefined;
  const lowSide: LowPointSide | undefined =
    lowX === undefined || !Number.isFinite(lowX)
      ? undefined
      : lowX < 0
        ? 'near'
        : lowX > span
          ? 'far'
          : 'inside';
  // Keep room for the labels written under the low point or under the support it lies beyond.
  const needs =
    main && lowX !== undefined && lowSide === 'inside'
      ? [{ z: curveElevation(span, rise, main, lowX), room: LOW_POINT_LABEL_ROOM }]
      : lowSide === 'near'
        ? [{ z: 0, room: BEYOND_LABEL_ROOM }]
        : lowSide === 'far'
          ? [{ z: rise, room: BEYOND_LABEL_ROOM }]
          : [];
  const layout = layoutProfileWithRoom(box, world, needs);
  const { viewX, viewY, plot } = layout;

  const ids = {
    title: `${baseId}-title`,
    desc: `${baseId}-desc`,
    clip: `${baseId}-clip`,
    arrow: `${baseId}-arrow`,
    hatch: `${baseId}-hatch`,
  };

  const verticalNote =
    layout.verticalFactor > 1 ? `vertical scale ×${layout.verticalFactor}` : 'true scale (no exaggeration)';

  // Supports stand on the ground when it is known, else on a base line along the plot's bottom edge.
  const baseZ = layout.worldZ(plot.bottom);
  const poleBase = (x: number): number => groundInterpolated(ground, x, datum) ?? baseZ;

  const descParts = [
    `Span ${formatLength(span, unitSystem)}, far attachment ${formatLength(Math.abs(rise), unitSystem)} ${rise >= 0 ? 'above' : 'below'} the near one.`,
  ];
  if (main && midSag !== undefined)
    descParts.push(`${main.label}: midspan sag ${formatLength(midSag, unitSystem)}.`);
  if (lowSide === 'inside' && lowX !== undefined)
    descParts.push(`Low point ${formatLength(lowX, unitSystem)} from the near support.`);
  if (lowSide === 'near') descParts.push('Low point lies beyond the near support.');
  if (lowSide === 'far') descParts.push('Low point lies beyond the far support.');
  if (clearance !== undefined)
    descParts.push(`Required clearance ${formatLength(clearance, unitSystem)} over ground shown.`);
  descParts.push(`Drawn with ${verticalNote}.`);

  // The sag label sits right of its dimension line unless it would run into the far support.
  const sagText = midSag === undefined ? '' : `sag ${formatLength(midSag, unitSystem)}`;
  const sagLabelRight =
    viewX(span / 2) + 10 + sagText.length * LABEL_CHAR_WIDTH <= viewX(span) - POLE_WIDTH / 2 - 4;

  const hasSight = marks.some((m) => m.kind === 'sight-line' || m.kind === 'sight-angle');
  const hasPoints = marks.some((m) => m.kind === 'point');
  const hasReadings = marks.some((m) => m.kind === 'sag-reading');

  return (
    <figure class="span-profile" ref={containerRef}>
      <svg
        class="span-profile__drawing"
        viewBox={`0 0 ${box.width} ${box.height}`}
        width="100%"
        preserveAspectRatio="xMidYMid meet"
        role="img"
        aria-labelledby={`${ids.title} ${ids.desc}`}
      >
        <title id={ids.title}>{titleText}</title>
        <desc id={ids.desc}>{descParts.join(' ')}</desc>
        <defs>
          <clipPath id={ids.clip}>
            <rect x={plot.left} y={plot.top} width={plot.right - plot.left} height={plot.bottom - plot.top} />
          </clipPath>
          <marker
            id={ids.arrow}
            viewBox="0 0 10 10"
            refX="9"
            refY="5"
            markerUnits="userSpaceOnUse"
            markerWidth="14"
            markerHeight="14"
            orient="auto-start-reverse"
          >
            <path d="M0 0 L10 5 L0 10 Z" fill={PROFILE_INK.ink} />
          </marker>
          <pattern
            id={ids.hatch}
            width="10"
            height="10"
            patternUnits="userSpaceOnUse"
            patternTransform="rotate(45)"
          >
            <rect width="10" height="10" fill={PROFILE_INK.ground} />
            <line x1="0" y1="0" x2="0" y2="10" stroke={PROFILE_INK.softInk} stroke-width="1.5" />
          </pattern>
        </defs>

        <rect
          class="span-profile__paper"
          x="0"
          y="0"
          width={box.width}
          height={box.height}
          fill={PROFILE_INK.paper}
        />

        <ProfileAxes
          layout={layout}
          span={span}
          datum={datum}
          absolute={props.nearAttachmentElevation !== undefined}
          unitSystem={unitSystem}
          verticalNote={verticalNote}
        />

        <g clip-path={`url(#${ids.clip})`}>
          {/* Ground and required clearance */}
          {ground.length > 0 ? (
            <g class="span-profile__ground">
              <path
                d={`${pathThrough(
                  ground.map((p) => ({ x: p.x, z: p.elevation - datum })),
                  layout,
                )} L${viewX(ground[ground.length - 1]?.x ?? 0)} ${plot.bottom} L${viewX(ground[0]?.x ?? 0)} ${plot.bottom} Z`}
                fill={`url(#${ids.hatch})`}
                stroke="none"
              />
              <path
                d={pathThrough(
                  ground.map((p) => ({ x: p.x, z: p.elevation - datum })),
                  layout,
                )}
                {...strokeProps(GROUND_STROKE)}
              />
            </g>
          ) : (
            <line
              class="span-profile__baseline"
              x1={plot.left}
              y1={viewY(baseZ)}
              x2={plot.right}
              y2={viewY(baseZ)}
              {...strokeProps(GROUND_STROKE)}
            />
          )}
          {clearance !== undefined && (
            <path
              class="span-profile__clearance"
              d={pathThrough(
                ground.map((p) => ({ x: p.x, z: p.elevation - datum + clearance })),
                layout,
              )}
              {...strokeProps(CLEARANCE_STROKE)}
            />
          )}

          {/* Supports */}
          {[0, span].map((x, k) => {
            const z = k === 0 ? 0 : rise;
            const top = viewY(z) - POLE_TOP_ABOVE_ATTACHMENT;
            const bottom = viewY(poleBase(x));
            return (
              <rect
                key={`pole${k}`}
                class="span-profile__support"
                x={viewX(x) - POLE_WIDTH / 2}
                y={Math.min(top, bottom)}
                width={POLE_WIDTH}
                height={Math.abs(bottom - top)}
                fill={PROFILE_INK.softInk}
              />
            );
          })}

          {/* Chord */}
          <line
            class="span-profile__chord"
            x1={viewX(0)}
            y1={viewY(0)}
            x2={viewX(span)}
            y2={viewY(rise)}
            {...strokeProps(CHORD_STROKE)}
          />

          <SightLines layout={layout} span={span} rise={rise} marks={marks} />

          {/* Wires: design and hot first, measured on top */}
          {[...sampled]
            .sort((a, b) => (a.curve.style === 'measured' ? 1 : 0) - (b.curve.style === 'measured' ? 1 : 0))
            .map((s, k) => (
              <path
                key={`wire${k}`}
                class={`span-profile__wire span-profile__wire--${s.curve.style}`}
                data-style={s.curve.style}
                d={pathThrough(s.points, layout)}
                {...strokeProps(CURVE_STROKES[s.curve.style])}
              >
                <title>{s.curve.label}</title>
              </path>
            ))}
        </g>

        {/* Attachments */}
        {[0, span].map((x, k) => (
          <circle
            key={`att${k}`}
            class="span-profile__attachment"
            cx={viewX(x)}
            cy={viewY(k === 0 ? 0 : rise)}
            r="6"
            fill={PROFILE_INK.paper}
            stroke={PROFILE_INK.ink}
            stroke-width="2.5"
          />
        ))}

        <ReadingMarks layout={layout} span={span} rise={rise} marks={marks} unitSystem={unitSystem} />

        {/* Midspan sag dimension */}
        {main && midSag !== undefined && Number.isFinite(midSag) && (
          <g class="span-profile__sag">
            <line
              x1={viewX(span / 2)}
              y1={viewY(rise / 2)}
              x2={viewX(span / 2)}
              y2={viewY(rise / 2 - midSag)}
              stroke={PROFILE_INK.ink}
              stroke-width="1.5"
              marker-start={`url(#${ids.arrow})`}
              marker-end={`url(#${ids.arrow})`}
            />
            <text
              class="span-profile__sag-label span-profile__label"
              x={sagLabelRight ? viewX(span / 2) + 10 : viewX(span / 2) - 26}
              text-anchor={sagLabelRight ? 'start' : 'end'}
              y={(viewY(rise / 2) + viewY(rise / 2 - midSag)) / 2 + 6}
              fill={PROFILE_INK.ink}
              {...HALO}
            >
              {sagText}
            </text>
          </g>
        )}

        {main && lowX !== undefined && lowSide !== undefined && (
          <LowPointMarker
            layout={layout}
            span={span}
            rise={rise}
            main={main}
            lowX={lowX}
            lowSide={lowSide}
            arrowId={ids.arrow}
            unitSystem={unitSystem}
          />
        )}
      </svg>

      <ProfileLegend
        curves={curves}
        hasGround={ground.length > 0}
        clearance={clearance}
        hasSight={hasSight}
        hasReadings={hasReadings}
        hasPoints={hasPoints}
        lowPointOf={lowSide === 'inside' ? main?.label : undefined}
        unitSystem={unitSystem}
      />
    </figure>
  );
}
