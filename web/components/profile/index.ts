/**
 * Span profile drawing.
 *
 * `<SpanProfile span rise curves unitSystem … />` draws one span side-on as SVG that scales with the screen:
 * supports, chord (dashed), one or more wires, the midspan sag dimension of the main wire with its value, its low
 * point (or an arrow "low point beyond near/far support" when it lies outside the span), readings, ground and the
 * required-clearance line, a stated vertical exaggeration ("vertical scale ×N") and a text legend.
 *
 * Props (all lengths SI metres, relative to the near attachment at (0, 0)):
 * - `span: number` horizontal distance between attachments (> 0); `rise: number` far minus near elevation.
 * - `curves: ProfileCurve[]` with `{ label: string; catenaryParameter: number /* C = H/w, m *\/;
 *   style: 'measured' | 'design' | 'hot' | 'parabola' }`. Drawn solid / long dash / dash-dot / short dash.
 *   The first 'measured' curve (else the first) is the main wire: sag dimension and low point.
 * - `readings?: ProfileMark[]`: `{ kind: 'sag-reading'; x; sag; label? }`, `{ kind: 'point'; x; z; label? }`,
 *   `{ kind: 'sight-line'; nearDrop; farDrop }`, `{ kind: 'sight-angle'; nearDrop; angle /* rad *\/ }`.
 * - `lowPointX?: number` override of the main wire's low point (computed with core otherwise).
 * - `ground?: { x; elevation }[]` in the datum of `nearAttachmentElevation?` (0 = relative to the near attachment);
 *   `requiredClearance?: number` draws ground + clearance.
 * - `unitSystem: 'metric' | 'us'` for every label. `title?` accessible title. `layoutWidth?` fixes the drawing
 *   width (print, tests); otherwise it follows the container so text stays true size.
 *
 * Curves with a missing or non-positive catenary parameter are skipped; a missing span shows a short note.
 */
export { ProfileBoundary } from './ProfileBoundary';
export { SpanProfile, type SpanProfileProps, type ProfileMark, type GroundPoint } from './SpanProfile';
export type { ProfileCurve, CurveStyle } from './profile-curves';
export type { UnitSystem } from './display-units';
