// One place for the drawing's inks and dash patterns, so the legend and the drawing cannot disagree.
// Palette: dark ink on near-white with one strong accent; every line also differs by dash pattern and width,
// so nothing depends on telling colours apart.
import type { CurveStyle } from './profile-curves';

export const PROFILE_INK = {
  paper: '#fbfaf5',
  ink: '#161b22',
  softInk: '#4f5b67',
  faintInk: '#9aa4ad',
  accent: '#b8400b',
  ground: '#d9d2c3',
} as const;

export interface StrokeStyle {
  stroke: string;
  width: number;
  /** SVG stroke-dasharray; undefined for a solid line. */
  dash: string | undefined;
}

/** Wires: solid for measured, long dash for design, dash-dot for hot day, short dash for the parabola check. */
export const CURVE_STROKES: Record<CurveStyle, StrokeStyle> = {
  measured: { stroke: PROFILE_INK.ink, width: 3.5, dash: undefined },
  design: { stroke: PROFILE_INK.softInk, width: 3, dash: '18 7' },
  hot: { stroke: PROFILE_INK.accent, width: 3, dash: '14 5 3 5' },
  parabola: { stroke: PROFILE_INK.softInk, width: 2, dash: '3 5' },
};

/** Straight line between the attachments. */
export const CHORD_STROKE: StrokeStyle = { stroke: PROFILE_INK.faintInk, width: 2, dash: '9 6' };
/** Ground plus the required clearance: accent, dash-dot-dot. */
export const CLEARANCE_STROKE: StrokeStyle = { stroke: PROFILE_INK.accent, width: 2.5, dash: '10 4 2 4 2 4' };
/** Ground surface. */
export const GROUND_STROKE: StrokeStyle = { stroke: PROFILE_INK.softInk, width: 2, dash: undefined };
/** Instrument sight lines: fine dots. */
export const SIGHT_STROKE: StrokeStyle = { stroke: PROFILE_INK.ink, width: 1.5, dash: '1.5 4' };

/** Order of the legend entries for wires. */
export const CURVE_STYLE_ORDER: readonly CurveStyle[] = ['measured', 'design', 'hot', 'parabola'];
