// Small drawing primitives shared by the parts of the span profile.
import type { ProfileLayout } from './profile-layout';
import { PROFILE_INK, type StrokeStyle } from './profile-styles';

/** Width of a support, user units. */
export const POLE_WIDTH = 10;
/** Rough width of one character of an 18 px label, user units: enough to decide which side a label goes. */
export const LABEL_CHAR_WIDTH = 10;

export interface StrokeAttributes {
  stroke: string;
  'stroke-width': number;
  'stroke-dasharray': string | undefined;
  fill: 'none';
  'stroke-linecap': 'butt';
  'stroke-linejoin': 'round';
}

/** White outline behind text so labels stay legible over lines, without relying on the stylesheet. */
export const HALO = {
  'paint-order': 'stroke',
  stroke: PROFILE_INK.paper,
  'stroke-width': 5,
  'stroke-linejoin': 'round',
} as const;

export function strokeProps(style: StrokeStyle): StrokeAttributes {
  return {
    stroke: style.stroke,
    'stroke-width': style.width,
    'stroke-dasharray': style.dash,
    fill: 'none',
    'stroke-linecap': 'butt',
    'stroke-linejoin': 'round',
  };
}

export function pathThrough(points: { x: number; z: number }[], layout: ProfileLayout): string {
  return points
    .map((p, k) => `${k === 0 ? 'M' : 'L'}${layout.viewX(p.x).toFixed(2)} ${layout.viewY(p.z).toFixed(2)}`)
    .join(' ');
}
