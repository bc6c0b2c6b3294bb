// Records → design judgement: builds core/assess inputs from a line's stored records and runs the assessment per
// reading, per wire (span × wire position) and per tension section. Data plumbing only; the physics is in core.
// Pure (no DOM, no storage), memoised per records object.
import { assessReading } from '../../core/assess/assess-reading';
import { assessWire } from '../../core/assess/combine';
import { assessSection, type SectionAssessment } from '../../core/assess/section-summary';
import { clearanceSiteFor, wireGeometry } from '../../core/records/wire-site';
import type {
  AssessSettings,
  ReadingAssessment,
  ReadingInput,
  SectionDesignInput,
  Verdict,
  WireAssessment,
} from '../../core/assess/types';
import { SpanInputError } from '../../core/errors';
import type { RecordSet } from '../../core/records/kinds';
import type { LineRecord } from '../../core/records/line';
import type { ReadingRecord } from '../../core/records/reading';
import type { SectionRecord } from '../../core/records/section';
import type { SpanRecord } from '../../core/records/span';
import type { WireRecord } from '../../core/records/wire';
import { knownUncertainties } from '../../core/assess/reading-inputs';
import { designExtrasOf, loadedConditionFor, tableCreepOffsetOf } from './design-extras';

/** What the judgement reads: a LineBundle from storage has these fields. */
export interface JudgementRecords {
  line: LineRecord;
  sections: SectionRecord[];
  spans: SpanRecord[];
  wires: WireRecord[];
  readings: ReadingRecord[];
}

/** A result, or the reason there is none (a SpanInputError code and message, or one of ours). */
export type Judged<T> = { ok: true; value: T } | { ok: false; code: string; message: string };

/** A verdict as the app shows it: core's four, plus the cases where there is nothing to judge. */
export type ShownVerdict = Verdict | 'no-design' | 'no-reading' | 'cannot-solve';

export interface ReadingJudgement {
  reading: ReadingRecord;
  /** The core input built from the records (absent when the span or section is missing). */
  input?: ReadingInput;
  result: Judged<ReadingAssessment>;
}

export interface WireJudgement {
  wire: WireRecord;
  span: SpanRecord;
  sectionId: string;
  /** Readings of this wire, oldest first. */
  readings: ReadingJudgement[];
  combined: Judged<WireAssessment>;
  verdict: ShownVerdict;
  /** Readings (by record id) that disagree with the others beyond their uncertainty. */
  disagreeing: { readingId: string; sigmas: number }[];
}

export interface SectionJudgement {
  section: SectionRecord;
  spans: SpanRecord[];
  design: Judged<SectionDesignInput>;
  settings: AssessSettings;
  wires: WireJudgement[];
  /** Counts, worst first and spread; absent when no wire could be judged. */
  summary?: SectionAssessment;
}

export interface LineJudgement {
  sections: SectionJudgement[];
  readings: Map<string, ReadingJudgement>;
  wires: Map<string, WireJudgement>;
  /** Worst verdict of each span's wires. */
  spans: Map<string, ShownVerdict>;
}

/** A RecordSet (what the app's screens load) as judgement records; undefined when it has no line. */
export function recordsFromSet(set: RecordSet): JudgementRecords | undefined {
  const line = set.line[0];
  if (!line) return undefined;
  return { line, sections: set.section, spans: set.span, wires: set.wire, readings: set.reading };
}

function failure(error: unknown): { ok: false; code: string; message: string } {
  if (error instanceof SpanInputError) return { ok: false, code: error.code, message: error.message };
  return { ok: false, code: 'unexpected', message: 'These figures could not be judged.' };
}

/**
 * The section as core's assessment sees it, or 'no-design' when the section has no design basis yet.
 * Span lengths come from the section's live spans; the ruling-span override from the design.
 */
export function sectionDesignInput(section: SectionRecord, spans: SpanRecord[]): Judged<SectionDesignInput> {
  const design = section.design;
  if (!design) {
    return { ok: false, code: 'no-design', message: 'This section has no design basis yet.' };
  }
  const c = section.conductor;
  const conductor: SectionDesignInput['conductor'] = {
    weight: c.weight,
    ratedStrength: c.ratedStrength,
    area: c.area,
    modulus: c.modulus,
    expansion: c.expansion,
    diameter: c.diameter,
    ...(c.composite ? { composite: { ...c.composite } } : {}),
  };
  const basis = design.basis;
  const creep = tableCreepOffsetOf(design);
  const basisInput: SectionDesignInput['basis'] =
    basis.kind === 'tension'
      ? { ...basis }
      : {
          kind: 'table',
          rows: basis.rows.map((row) => ({ ...row })),
          ...(basis.state ? { state: basis.state } : {}),
          ...(creep !== undefined ? { creepOffset: creep } : {}),
        };
  const input: SectionDesignInput = {
    conductor,
    basis: basisInput,
    spanLengths: spans.filter((span) => span.sectionId === section.id).map((span) => span.length),
    maxDesignTemperature: design.maxDesignTemperature,
    terrainCategory: design.terrainCategory,
  };
  if (design.rulingSpanOverride !== undefined) input.rulingSpanOverride = design.rulingSpanOverride;
  if (input.spanLengths.length === 0 && input.rulingSpanOverride === undefined) {
    return { ok: false, code: 'spans-empty', message: 'This section has no spans yet.' };
  }
  return { ok: true, value: input };
}

/** Settings of the checks from the section's design (absent fields take core's documented defaults). */
export function assessSettingsFor(section: SectionRecord): AssessSettings {
  const design = section.design;
  if (!design) return {};
  const extras = designExtrasOf(design);
  const settings: AssessSettings = {};
  if (design.tolerance) settings.tolerance = { ...design.tolerance };
  if (extras.compareState) settings.compareState = extras.compareState;
  if (extras.vibrationTemperature !== undefined) settings.vibrationTemperature = extras.vibrationTemperature;
  if (extras.uncertainty) settings.uncertainty = { ...extras.uncertainty };
  const loaded = loadedConditionFor(extras, section.conductor);
  if (loaded) settings.loadedCondition = loaded;
  return settings;
}

/** The core input of one reading: this wire's geometry, the measurement, temperature, site and overrides. */
export function readingInputFor(
  reading: ReadingRecord,
  span: SpanRecord,
  wire: WireRecord | undefined,
): ReadingInput {
  const input: ReadingInput = {
    id: reading.id,
    geometry: wireGeometry(span, wire).geometry,
    measurement: reading.measurement,
    conductorTemperature: reading.conductorTemperature,
  };
  const site = clearanceSiteFor(span, wire);
  if (site) input.site = site;
  const uncertainty = knownUncertainties(reading.uncertainty);
  if (uncertainty) input.uncertainty = uncertainty;
  return input;
}

/** Judges one reading; never throws (a refusal comes back with its code and message). */
export function judgeReading(
  design: Judged<SectionDesignInput>,
  input: ReadingInput,
  settings: AssessSettings,
): Judged<ReadingAssessment> {
  if (!design.ok) return design;
  try {
    return { ok: true, value: assessReading(design.value, input, settings) };
  } catch (error) {
    return failure(error);
  }
}

/** Order of badness, worst first, for a span's overall verdict. */
const SEVERITY: readonly ShownVerdict[] = [
  'too-slack',
  'too-tight',
  'cannot-solve',
  'recheck',
  'within',
  'no-reading',
  'no-design',
];

/** The worst of several verdicts ('no-reading' for none). */
export function worstVerdict(verdicts: ShownVerdict[]): ShownVerdict {
  let worst: ShownVerdict | undefined;
  for (const verdict of verdicts) {
    if (worst === undefined || SEVERITY.indexOf(verdict) < SEVERITY.indexOf(worst)) worst = verdict;
  }
  return worst ?? 'no-reading';
}

function judgeWire(
  wire: WireRecord,
  span: SpanRecord,
  readings: ReadingRecord[],
  design: Judged<SectionDesignInput>,
  settings: AssessSettings,
): WireJudgement {
  const judged: ReadingJudgement[] = readings.map((reading) => {
    const input = readingInputFor(reading, span, wire);
    return { reading, input, result: judgeReading(design, input, settings) };
  });
  const base = { wire, span, sectionId: span.sectionId, readings: judged, disagreeing: [] };
  if (!design.ok) {
    return { ...base, combined: design, verdict: design.code === 'no-design' ? 'no-design' : 'cannot-solve' };
  }
  if (judged.length === 0) {
    return {
      ...base,
      combined: { ok: false, code: 'no-reading', message: 'No reading of this wire yet.' },
      verdict: 'no-reading',
    };
  }
  const solved = judged.flatMap((item) => (item.result.ok ? [item.result.value] : []));
  if (solved.length === 0) {
    const first = judged[0]?.result;
    const combined = first && !first.ok ? first : failure(undefined);
    return { ...base, combined, verdict: 'cannot-solve' };
  }
  try {
    const value = assessWire(solved, settings);
    const disagreeing = value.disagreeing.map((item) => ({
      readingId: item.id ?? solved[item.index]?.id ?? '',
      sigmas: item.sigmas,
    }));
    return { ...base, combined: { ok: true, value }, verdict: value.verdict.verdict, disagreeing };
  } catch (error) {
    return { ...base, combined: failure(error), verdict: 'cannot-solve' };
  }
}

/** Judges one tension section: every wire of every span, then the section summary. */
export function judgeSection(records: JudgementRecords, section: SectionRecord): SectionJudgement {
  const spans = records.spans.filter((span) => span.sectionId === section.id);
  const design = sectionDesignInput(section, records.spans);
  const settings = assessSettingsFor(section);
  const wires: WireJudgement[] = [];
  for (const span of spans) {
    for (const wire of records.wires.filter((item) => item.spanId === span.id)) {
      const readings = records.readings.filter((reading) => reading.wireId === wire.id);
      wires.push(judgeWire(wire, span, readings, design, settings));
    }
  }
  const judgement: SectionJudgement = { section, spans, design, settings, wires };
  const combined = wires.flatMap((item) =>
    item.combined.ok ? [{ id: item.wire.id, group: item.wire.label, wire: item.combined.value }] : [],
  );
  if (combined.length > 0) {
    try {
      judgement.summary = assessSection(combined, settings);
    } catch {
      // A summary that cannot be made leaves the wires' own verdicts standing.
    }
  }
  return judgement;
}

const memo = new WeakMap<object, LineJudgement>();

/**
 * Judges a whole line. Accepts a LineBundle (storage) or a RecordSet (the app's loaded records); the result is
 * memoised per object, so screens can call it on every render of the same load.
 */
export function judgeLine(source: JudgementRecords | RecordSet): LineJudgement {
  const cached = memo.get(source);
  if (cached) return cached;
  const records = 'sections' in source ? source : recordsFromSet(source);
  const judgement: LineJudgement = {
    sections: [],
    readings: new Map(),
    wires: new Map(),
    spans: new Map(),
  };
  if (records) {
    for (const section of records.sections) {
      const sectionJudgement = judgeSection(records, section);
      judgement.sections.push(sectionJudgement);
      for (const wire of sectionJudgement.wires) {
        judgement.wires.set(wire.wire.id, wire);
        for (const reading of wire.readings) judgement.readings.set(reading.reading.id, reading);
      }
      for (const span of sectionJudgement.spans) {
        const verdicts = sectionJudgement.wires
          .filter((wire) => wire.span.id === span.id)
          .map((wire) => wire.verdict);
        judgement.spans.set(span.id, worstVerdict(verdicts));
      }
    }
  }
  memo.set(source, judgement);
  return judgement;
}

/** True when a reading has a judgement to show (its section has a design and the reading solved). */
export function readingIsJudged(source: JudgementRecords | RecordSet, readingId: string): boolean {
  return judgeLine(source).readings.get(readingId)?.result.ok === true;
}
