// Maps span coordinates (m: x from the near support, z above the near attachment) to drawing coordinates,
// with a stated vertical exaggeration because sag is small against span.

/** Drawing box, in SVG user units (≈ CSS px when the drawing is shown at its layout width). */
export interface ProfileBox {
  width: number;
  height: number;
}

/** World window to fit into the plot area, m. */
export interface WorldBounds {
  xMin: number;
  xMax: number;
  zMin: number;
  zMax: number;
}

export interface ProfileLayout {
  box: ProfileBox;
  plot: { left: number; top: number; right: number; bottom: number };
  /** Vertical exaggeration: vertical user units per metre ÷ horizontal user units per metre (1, 2, 5, 10, …). */
  verticalFactor: number;
  /** The world window actually drawn (its bottom may sit lower than asked, to make room for labels). */
  world: WorldBounds;
  /** Vertical user units per metre. */
  verticalScale: number;
  /** Horizontal position in the drawing of x m. */
  viewX: (x: number) => number;
  /** Vertical position in the drawing of z m (SVG y grows downward). */
  viewY: (z: number) => number;
  /** Elevation, m, drawn at vertical position y (inverse of viewY). */
  worldZ: (y: number) => number;
}

/** Space kept around the plot for tick labels and the scale note, user units. */
export const PROFILE_MARGIN = { left: 64, right: 20, top: 54, bottom: 52 } as const;

/** The largest whole number up to 10, or of 10, 20, 50, 100, … above, not above `limit` (at least 1). */
export function niceFactorAtMost(limit: number): number {
  if (!(limit >= 1) || !Number.isFinite(limit)) return 1;
  if (limit < 20) return Math.min(10, Math.floor(limit));
  let best = 1;
  for (let decade = 1; decade <= limit; decade *= 10) {
    for (const step of [1, 2, 5]) {
      if (step * decade <= limit) best = step * decade;
    }
  }
  return best;
}

/** A round tick step (1, 2 or 5 × 10ⁿ) giving about `count` intervals over `range`. */
export function niceStep(range: number, count: number): number {
  const raw = Math.abs(range) / Math.max(1, count);
  if (!(raw > 0) || !Number.isFinite(raw)) return 1;
  const decade = 10 ** Math.floor(Math.log10(raw));
  const mantissa = raw / decade;
  const step = mantissa < 1.5 ? 1 : mantissa < 3.5 ? 2 : mantissa < 7.5 ? 5 : 10;
  return step * decade;
}

/** Tick values that are multiples of `step` inside [lo, hi]. */
export function ticksBetween(lo: number, hi: number, step: number): number[] {
  const ticks: number[] = [];
  const first = Math.ceil(lo / step - 1e-9);
  const last = Math.floor(hi / step + 1e-9);
  for (let k = first; k <= last && ticks.length < 50; k += 1) ticks.push(k * step);
  return ticks;
}

/**
 * Fits the world window into the box. The horizontal scale fills the plot width; the vertical scale is the
 * same times the largest round factor that still fits (so the drawing can say "vertical scale ×N"). When even
 * true scale is too tall (a very steep span), both scales shrink together and the plot is centred.
 */
export function layoutProfile(box: ProfileBox, world: WorldBounds): ProfileLayout {
  const plot = {
    left: PROFILE_MARGIN.left,
    top: PROFILE_MARGIN.top,
    right: box.width - PROFILE_MARGIN.right,
    bottom: box.height - PROFILE_MARGIN.bottom,
  };
  const plotWidth = plot.right - plot.left;
  const plotHeight = plot.bottom - plot.top;
  const xRange = Math.max(world.xMax - world.xMin, 1e-9);
  const zRange = Math.max(world.zMax - world.zMin, xRange * 1e-6);
  let horizontalScale = plotWidth / xRange;
  let verticalFactor = niceFactorAtMost(plotHeight / (zRange * horizontalScale));
  let xOffset = plot.left;
  if (zRange * horizontalScale > plotHeight) {
    horizontalScale = plotHeight / zRange;
    verticalFactor = 1;
    xOffset = plot.left + (plotWidth - xRange * horizontalScale) / 2;
  }
  const verticalScale = horizontalScale * verticalFactor;
  // Centre the world's vertical extent in the plot.
  const zMid = (world.zMin + world.zMax) / 2;
  const yMid = (plot.top + plot.bottom) / 2;
  return {
    box,
    plot,
    verticalFactor,
    world,
    verticalScale,
    viewX: (x) => xOffset + (x - world.xMin) * horizontalScale,
    viewY: (z) => yMid - (z - zMid) * verticalScale,
    worldZ: (y) => zMid - (y - yMid) / verticalScale,
  };
}

/** A height that must stay free below a drawn elevation, in user units (for labels under a mark). */
export interface RoomBelow {
  z: number;
  room: number;
}

/**
 * Like layoutProfile, but lowers the bottom of the world window until each `needs` entry has its room between
 * its elevation and the plot's bottom edge. Two passes suffice: the second only ever lowers the factor.
 */
export function layoutProfileWithRoom(
  box: ProfileBox,
  world: WorldBounds,
  needs: RoomBelow[],
): ProfileLayout {
  let window = world;
  let layout = layoutProfile(box, window);
  for (let pass = 0; pass < 3; pass += 1) {
    const shortfall = Math.max(0, ...needs.map((n) => layout.viewY(n.z) + n.room - layout.plot.bottom));
    if (shortfall <= 0.5) break;
    window = { ...window, zMin: window.zMin - (shortfall * 1.05) / layout.verticalScale };
    layout = layoutProfile(box, window);
  }
  return layout;
}
