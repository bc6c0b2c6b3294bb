// Printable inspection report: per line a summary, each span's profile and checks, the cautions and a sign-off
// block. The browser's print dialog turns it into paper or a PDF. All text from records goes in as text children,
// which Preact escapes; nothing here sets raw HTML.
import {
  type InspectionLogInput,
  type ReadingContext,
  type ReadingResult,
  LOG_METHOD_LABELS,
  LOG_VERDICT_LABELS,
  type AssessedReading,
  describeMeasurementForLog,
  governingReading,
  inspectionLogContexts,
  latestReadingPerWire,
} from '../../core/exports';
import { type QuantityKind, type UnitSystem, formatQuantity } from '../../core/units';
import { SpanProfile, type GroundPoint, type ProfileCurve } from '../components/profile';
import './print.css';

export interface PrintReportProps {
  /** One entry per line to report: its records and the result function (as for the inspection log). */
  lines: readonly InspectionLogInput[];
  /** ISO 8601 time the report was prepared (shown in the heading). */
  preparedAt: string;
  /** BCP 47 locale for decimal separators and dates; '.' and ISO dates when absent. */
  locale?: string;
  /** Show the "Print / save as PDF" button (hidden on paper anyway); default true. */
  showPrintButton?: boolean;
  /** Width of the profile drawings, px; default {@link REPORT_PROFILE_WIDTH}. */
  profileWidth?: number;
}

/** Fits an A4 or US Letter page in portrait with 15 mm margins at 96 px per inch. */
export const REPORT_PROFILE_WIDTH = 680;

/** Symbols beside the verdict words so the verdict reads without colour. */
const VERDICT_SYMBOLS: Readonly<Record<string, string>> = {
  within: '✓',
  'too-slack': '▼',
  'too-tight': '▲',
  recheck: '?',
};

/** The cautions printed on every report (SPEC section 7). */
export const REPORT_CAUTIONS: readonly string[] = [
  'Results are estimates made for inspection. They are not a substitute for engineering review.',
  'Follow local codes, the owner’s standards and licensed engineering practice; they govern over this report.',
  'Only strike or touch conductors that are de-energized and grounded under the employer’s work rules.',
  'Keep the minimum approach distances to energized parts at all times.',
];

/** Opens the browser's print dialog (where "Save as PDF" is offered). */
export function printReport(): void {
  window.print();
}

function quantity(
  valueSI: number | undefined,
  kind: QuantityKind,
  system: UnitSystem,
  locale?: string,
): string {
  if (valueSI === undefined || !Number.isFinite(valueSI)) return '—';
  const { value, unit } = formatQuantity(valueSI, kind, system, locale === undefined ? {} : { locale });
  return unit === '%' ? `${value} %` : `${value} ${unit}`;
}

function signed(text: string): string {
  return /^[0-9]/.test(text) && !/^0(\.0+)?\s/.test(text) ? `+${text}` : text;
}

function showTime(iso: string, locale?: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return iso;
  return locale === undefined
    ? `${iso.slice(0, 16).replace('T', ' ')} UTC`
    : // With the time zone: a signed report may be read far from where the readings were taken.
      date.toLocaleString(locale, {
        year: 'numeric',
        month: 'short',
        day: 'numeric',
        hour: 'numeric',
        minute: '2-digit',
        timeZoneName: 'short',
      });
}

function VerdictText({ result }: { result: ReadingResult | undefined }) {
  if (result?.error !== undefined) return <span class="report-verdict report-verdict--none">Not solved</span>;
  const verdict = result?.verdict;
  if (verdict === undefined) return <span class="report-verdict report-verdict--none">—</span>;
  return (
    <span class={`report-verdict report-verdict--${verdict}`}>
      {VERDICT_SYMBOLS[verdict] ?? '•'} {LOG_VERDICT_LABELS[verdict] ?? verdict}
    </span>
  );
}

interface SpanGroup {
  spanId: string;
  title: string;
  contexts: ReadingContext[];
  /** Result of every reading of the span, by reading id. */
  results: Map<string, ReadingResult | undefined>;
  governing: AssessedReading | undefined;
}

function groupBySpan(input: InspectionLogInput): SpanGroup[] {
  const groups = new Map<string, SpanGroup>();
  for (const context of inspectionLogContexts(input)) {
    let group = groups.get(context.span.id);
    if (!group) {
      group = {
        spanId: context.span.id,
        title: `${context.nearStructure?.label ?? '?'}–${context.farStructure?.label ?? '?'}`,
        contexts: [],
        results: new Map(),
        governing: undefined,
      };
      groups.set(context.span.id, group);
    }
    group.contexts.push(context);
    group.results.set(context.reading.id, input.resultFor?.(context));
  }
  for (const group of groups.values()) {
    const latest = latestReadingPerWire(group.contexts).map((context) => ({
      context,
      result: group.results.get(context.reading.id),
    }));
    group.governing = governingReading(latest);
  }
  return [...groups.values()];
}

function SpanDrawing({ entry, width }: { entry: AssessedReading; width: number }) {
  const { context, result } = entry;
  const { span, wire, section, line } = context;
  const weight = section?.conductor.weight;
  const nearElevation = span.nearAttachmentElevation + wire.nearOffset;
  const rise = span.farAttachmentElevation + wire.farOffset - nearElevation;
  const curves: ProfileCurve[] = [];
  if (weight !== undefined && result?.horizontalTension !== undefined) {
    curves.push({
      label: `measured, wire ${wire.label}`,
      catenaryParameter: result.horizontalTension / weight,
      style: 'measured',
    });
  }
  if (weight !== undefined && result?.designHorizontalTension !== undefined) {
    curves.push({
      label: 'design at the same temperature',
      catenaryParameter: result.designHorizontalTension / weight,
      style: 'design',
    });
  }
  if (curves.length === 0) return <p class="print-report__note">No solved reading to draw for this span.</p>;
  const ground: GroundPoint[] = [];
  if (span.nearGroundElevation !== undefined) ground.push({ x: 0, elevation: span.nearGroundElevation });
  for (const point of span.groundPoints ?? []) ground.push(point);
  if (span.farGroundElevation !== undefined)
    ground.push({ x: span.length, elevation: span.farGroundElevation });
  ground.sort((a, b) => a.x - b.x);
  return (
    <SpanProfile
      span={span.length}
      rise={rise}
      nearAttachmentElevation={nearElevation}
      curves={curves}
      {...(ground.length > 0 ? { ground } : {})}
      {...(span.requiredClearance === undefined ? {} : { requiredClearance: span.requiredClearance })}
      unitSystem={line.unitSystem}
      title={`Profile of span ${context.nearStructure?.label ?? ''}–${context.farStructure?.label ?? ''}, wire ${wire.label}`}
      layoutWidth={width}
    />
  );
}

function ChecksTable({
  contexts,
  results,
  system,
  locale,
}: {
  contexts: ReadingContext[];
  results: Map<string, ReadingResult | undefined>;
  system: UnitSystem;
  locale: string | undefined;
}) {
  return (
    <div class="print-report__scroll">
      <table class="print-report__table print-report__checks">
        <thead>
          <tr>
            <th scope="col">Wire</th>
            <th scope="col">Method and readings</th>
            <th scope="col">Horizontal tension</th>
            <th scope="col">Sag / design sag</th>
            <th scope="col">Deviation</th>
            <th scope="col">Rated strength used</th>
            <th scope="col">Clearance margin</th>
            <th scope="col">Verdict and reason</th>
          </tr>
        </thead>
        <tbody>
          {contexts.map((context) => {
            const result = results.get(context.reading.id);
            const { reading } = context;
            return (
              <tr key={reading.id}>
                <td>{context.wire.label}</td>
                <td>
                  <strong>{LOG_METHOD_LABELS[reading.measurement.method]}</strong>
                  <br />
                  {describeMeasurementForLog(reading.measurement, system)}
                  <br />
                  conductor at {quantity(reading.conductorTemperature, 'temperature', system, locale)}
                  <br />
                  <span class="print-report__small">
                    {showTime(reading.takenAt, locale)} · {reading.inspector || 'inspector not recorded'}
                  </span>
                  {reading.notes ? <p class="print-report__notes">{reading.notes}</p> : null}
                </td>
                <td>{quantity(result?.horizontalTension, 'tension', system, locale)}</td>
                <td>
                  {quantity(result?.sag, 'sag', system, locale)} /{' '}
                  {quantity(result?.designSag, 'sag', system, locale)}
                </td>
                <td>{signed(quantity(result?.sagDeviation, 'sag', system, locale))}</td>
                <td>{quantity(result?.percentOfRatedStrength, 'percent', system, locale)}</td>
                <td>{signed(quantity(result?.clearanceMargin, 'sag', system, locale))}</td>
                <td>
                  <VerdictText result={result} />
                  {(result?.error ?? result?.verdictReason) ? (
                    <p class="print-report__reason">{result?.error ?? result?.verdictReason}</p>
                  ) : null}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}

function LineReport({
  input,
  preparedAt,
  locale,
  profileWidth,
}: {
  input: InspectionLogInput;
  preparedAt: string;
  locale: string | undefined;
  profileWidth: number;
}) {
  const { line } = input;
  const system = line.unitSystem;
  const groups = groupBySpan(input);
  const counts = new Map<string, number>();
  for (const group of groups) {
    const verdict = group.governing?.result?.verdict ?? 'none';
    counts.set(verdict, (counts.get(verdict) ?? 0) + 1);
  }
  const readingCount = groups.reduce((sum, group) => sum + group.contexts.length, 0);
  const inspectors = [
    ...new Set(groups.flatMap((group) => group.contexts.map((c) => c.reading.inspector))),
  ].filter(Boolean);
  const sectionNames = new Map(input.sections.map((section) => [section.id, section]));
  return (
    <section class="print-report__line" aria-label={`Report for line ${line.name}`}>
      <header class="print-report__header">
        <h1>Sag inspection report: {line.name}</h1>
        <dl class="print-report__facts">
          {line.owner ? (
            <>
              <dt>Owner</dt>
              <dd>{line.owner}</dd>
            </>
          ) : null}
          {line.client ? (
            <>
              <dt>Client</dt>
              <dd>{line.client}</dd>
            </>
          ) : null}
          <dt>Prepared</dt>
          <dd>{showTime(preparedAt, locale)}</dd>
          <dt>Units</dt>
          <dd>{system === 'us' ? 'US customary' : 'Metric'}</dd>
          <dt>Spans read</dt>
          <dd>
            {groups.length} spans, {readingCount} readings
          </dd>
        </dl>
        {line.notes ? <p class="print-report__notes">{line.notes}</p> : null}
      </header>

      <aside class="print-report__cautions" role="note" aria-label="Cautions">
        <h2>Cautions</h2>
        <ul>
          {REPORT_CAUTIONS.map((text) => (
            <li key={text}>{text}</li>
          ))}
        </ul>
      </aside>

      <h2>Summary</h2>
      <table class="print-report__table print-report__counts">
        <thead>
          <tr>
            <th scope="col">Verdict (worst wire of each span, latest readings)</th>
            <th scope="col">Spans</th>
          </tr>
        </thead>
        <tbody>
          {['too-tight', 'too-slack', 'recheck', 'within', 'none'].map((verdict) => (
            <tr key={verdict}>
              <td>
                {verdict === 'none'
                  ? 'No verdict (no design or not solved)'
                  : `${VERDICT_SYMBOLS[verdict] ?? ''} ${LOG_VERDICT_LABELS[verdict] ?? verdict}`}
              </td>
              <td>{counts.get(verdict) ?? 0}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <div class="print-report__scroll">
        <table class="print-report__table print-report__spans">
          <thead>
            <tr>
              <th scope="col">Span</th>
              <th scope="col">Section</th>
              <th scope="col">Length</th>
              <th scope="col">Governing wire</th>
              <th scope="col">Sag deviation</th>
              <th scope="col">Verdict</th>
            </tr>
          </thead>
          <tbody>
            {groups.map((group) => {
              const context = group.contexts[0];
              const section = context ? sectionNames.get(context.span.sectionId) : undefined;
              return (
                <tr key={group.spanId}>
                  <td>{group.title}</td>
                  <td>{section?.name ?? '—'}</td>
                  <td>{quantity(context?.span.length, 'length', system, locale)}</td>
                  <td>{group.governing?.context.wire.label ?? '—'}</td>
                  <td>{signed(quantity(group.governing?.result?.sagDeviation, 'sag', system, locale))}</td>
                  <td>
                    <VerdictText result={group.governing?.result} />
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>

      {groups.map((group) => {
        const section = group.contexts[0] ? sectionNames.get(group.contexts[0].span.sectionId) : undefined;
        return (
          <section class="print-report__span" key={group.spanId} aria-label={`Span ${group.title}`}>
            <h3>
              Span {group.title}
              {section ? (
                <span class="print-report__small">
                  {' '}
                  · section {section.name}, {section.conductor.name}
                </span>
              ) : null}
            </h3>
            {group.governing ? <SpanDrawing entry={group.governing} width={profileWidth} /> : null}
            <ChecksTable contexts={group.contexts} results={group.results} system={system} locale={locale} />
          </section>
        );
      })}

      <section class="print-report__signoff" aria-label="Sign-off">
        <h2>Sign-off</h2>
        {inspectors.length > 0 ? <p>Readings recorded by: {inspectors.join(', ')}</p> : null}
        <div class="print-report__signatures">
          {['Inspector', 'Reviewed by'].map((role) => (
            <div class="print-report__signature" key={role}>
              <p class="print-report__signature-role">{role}</p>
              <p>
                Name <span class="print-report__blank" />
              </p>
              <p>
                Date <span class="print-report__blank" />
              </p>
              <p>
                Signature <span class="print-report__blank print-report__blank--tall" />
              </p>
            </div>
          ))}
        </div>
      </section>
    </section>
  );
}

/** The report for one or more lines, each starting on a new page when printed. */
export function PrintReport({
  lines,
  preparedAt,
  locale,
  showPrintButton = true,
  profileWidth,
}: PrintReportProps) {
  return (
    <article class="print-report">
      {showPrintButton ? (
        <div class="print-report__actions">
          <button type="button" class="print-report__print" onClick={printReport}>
            Print / save as PDF
          </button>
          <p class="print-report__small">Choose “Save as PDF” as the printer to keep a file.</p>
        </div>
      ) : null}
      {lines.map((input) => (
        <LineReport
          key={input.line.id}
          input={input}
          preparedAt={preparedAt}
          locale={locale}
          profileWidth={profileWidth ?? REPORT_PROFILE_WIDTH}
        />
      ))}
    </article>
  );
}
