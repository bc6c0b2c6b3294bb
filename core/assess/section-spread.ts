/**
 * Across a tension section, spans share one horizontal tension at a given temperature: the spread of the
 * measured tensions (corrected to a common temperature) and the spans that stand out.
 */
import { DEFAULT_OUTLIER_MODIFIED_Z } from './defaults';
import type { SectionSpread, SectionTensionEntry } from './types';

/** Consistency constant of the median absolute deviation for normal data: 0.6745 ≈ Φ⁻¹(0.75). */
const MAD_CONSISTENCY = 0.6744897501960817;
/** Mean absolute deviation to σ for normal data, √(π/2), used when the MAD is zero. */
const MEAN_AD_CONSISTENCY = 1.2533141373155001;
/** Below this many entries no outliers are named: a median of two says nothing. */
export const MIN_ENTRIES_FOR_OUTLIERS = 3;

function median(sorted: number[]): number {
  const mid = Math.floor(sorted.length / 2);
  const upper = sorted[mid] ?? Number.NaN;
  return sorted.length % 2 === 1 ? upper : ((sorted[mid - 1] ?? Number.NaN) + upper) / 2;
}

/**
 * Spread of H within one group of spans and the outliers by modified z-score.
 * @param entries each span's H at the common temperature, N (finite, > 0)
 * @param threshold modified z-score above which a span is an outlier (default 3.5)
 * Method: M_i = 0.6745·(x_i − median)/MAD (Iglewicz & Hoaglin, 1993, from memory: |M| > 3.5 flags a potential
 * outlier). Median and MAD resist the outliers they look for, unlike mean and standard deviation. When more than
 * half the values are equal (MAD = 0) the mean absolute deviation scaled by √(π/2) stands in for σ; when every
 * value is equal there are no outliers.
 */
export function tensionSpread(
  entries: SectionTensionEntry[],
  threshold: number = DEFAULT_OUTLIER_MODIFIED_Z,
  group?: string,
): SectionSpread {
  const values = entries.map((e) => e.horizontalTension);
  const sorted = [...values].sort((a, b) => a - b);
  const center = median(sorted);
  const mad = median(values.map((v) => Math.abs(v - center)).sort((a, b) => a - b));
  const meanAbsolute = values.reduce((sum, v) => sum + Math.abs(v - center), 0) / Math.max(values.length, 1);
  const scale = mad > 0 ? mad / MAD_CONSISTENCY : meanAbsolute * MEAN_AD_CONSISTENCY;
  const enough = entries.length >= MIN_ENTRIES_FOR_OUTLIERS && scale > 0;
  const scored = entries.map((e) => {
    const modifiedZ = enough ? (e.horizontalTension - center) / scale : 0;
    return {
      id: e.id,
      horizontalTension: e.horizontalTension,
      modifiedZ,
      outlier: Math.abs(modifiedZ) > threshold,
    };
  });
  const min = sorted[0] ?? Number.NaN;
  const max = sorted[sorted.length - 1] ?? Number.NaN;
  const spread: SectionSpread = {
    count: entries.length,
    median: center,
    min,
    max,
    relativeSpread: (max - min) / center,
    robustSigma: mad / MAD_CONSISTENCY,
    entries: scored,
    outliers: scored.filter((e) => e.outlier).map((e) => e.id),
  };
  if (group !== undefined) spread.group = group;
  return spread;
}

/**
 * Spread per group (for example per wire label: each phase runs through the whole section), or of all entries
 * together when none has a group.
 * @param entries spans' H at the common temperature, N, with optional group
 * @param threshold modified z-score threshold (default 3.5, from memory)
 */
export function sectionSpread(
  entries: SectionTensionEntry[],
  threshold: number = DEFAULT_OUTLIER_MODIFIED_Z,
): SectionSpread[] {
  const groups = new Map<string | undefined, SectionTensionEntry[]>();
  for (const entry of entries) {
    const list = groups.get(entry.group) ?? [];
    list.push(entry);
    groups.set(entry.group, list);
  }
  return [...groups.entries()].map(([group, list]) => tensionSpread(list, threshold, group));
}
