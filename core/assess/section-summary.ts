/**
 * A tension section at a glance: verdict counts, the worst wires first, and the tension spread.
 */
import { DEFAULT_OUTLIER_MODIFIED_Z } from './defaults';
import { sectionSpread } from './section-spread';
import type { AssessSettings, SectionSpread, Verdict, WireAssessment } from './types';

/** One wire of the section with the caller's ids. */
export interface SectionWire {
  /** Caller's id of the wire (span + wire position). */
  id: string;
  /** Group for the spread (e.g. the wire label 'A'); all wires together when absent. */
  group?: string;
  wire: WireAssessment;
}

export interface SectionAssessment {
  counts: Record<Verdict, number>;
  /** Wire ids, worst first: furthest outside the tolerance first, recheck before within. */
  worstFirst: string[];
  spread: SectionSpread[];
}

const SEVERITY: Record<Verdict, number> = { 'too-slack': 0, 'too-tight': 0, recheck: 1, within: 2 };

/**
 * Summarizes a section's wires.
 * @param wires combined assessments (assessWire) with ids and optional groups
 * @param settings outlierModifiedZ (default 3.5, from memory)
 * Order: too slack and too tight first, then recheck, then within; inside each, by the smallest tolerance margin.
 */
export function assessSection(wires: SectionWire[], settings: AssessSettings = {}): SectionAssessment {
  const counts: Record<Verdict, number> = { within: 0, 'too-slack': 0, 'too-tight': 0, recheck: 0 };
  for (const w of wires) counts[w.wire.verdict.verdict]++;
  // Unknown margins (no uncertainty) sort after known ones within their verdict.
  const marginOf = (w: SectionWire): number =>
    Number.isFinite(w.wire.verdict.margin) ? w.wire.verdict.margin : Number.MAX_VALUE;
  const worstFirst = [...wires]
    .sort(
      (a, b) =>
        SEVERITY[a.wire.verdict.verdict] - SEVERITY[b.wire.verdict.verdict] || marginOf(a) - marginOf(b),
    )
    .map((w) => w.id);
  const spread = sectionSpread(
    wires
      .filter((w) => Number.isFinite(w.wire.combinedTension.value))
      .map((w) => {
        const entry = {
          id: w.id,
          horizontalTension: w.wire.combinedTension.value,
          sigma: w.wire.combinedTension.sigma,
        };
        return w.group === undefined ? entry : { ...entry, group: w.group };
      }),
    settings.outlierModifiedZ ?? DEFAULT_OUTLIER_MODIFIED_Z,
  );
  return { counts, worstFirst, spread };
}
