// One line: its tension sections, and in each the spans with every wire's latest result.
import type { RecordSet } from '../../../core/records/kinds';
import type { SpanRecord } from '../../../core/records/span';
import { rulingSpan } from '../../../core/ruling-span';
import type { UnitSystem } from '../../../core/units';
import { useData, useLineRecords } from '../../app/context';
import { wireGeometry } from '../../../core/records/wire-site';
import { latestReading, readingContext, solveReading } from '../../app/derive';
import { show } from '../../app/format';
import { lineLogInput } from '../../app/log-input';
import { href, navigate } from '../../app/router';
import { Badge } from '../../components/badge/Badge';
import { Button, LinkButton } from '../../components/button/Button';
import { Crumbs } from '../../components/crumbs/Crumbs';
import { ExportPanel } from '../../exports/ExportPanel';
import { methodTitle } from '../reading/methods';
import { LineSectionSummary } from '../section-summary/LineSectionSummary';
import { WireVerdict } from '../../components/verdict/WireVerdict';
import './line.css';

/** Element id of the files block (report, exports, imports) at the foot of the screen. */
const FILES_BLOCK_ID = 'line-files';

function structureLabel(records: RecordSet, id: string): string {
  return records.structure.find((structure) => structure.id === id)?.label ?? '?';
}

function structureOrder(records: RecordSet, id: string): number {
  return records.structure.find((structure) => structure.id === id)?.order ?? 0;
}

function WireSummary({ records, span, units }: { records: RecordSet; span: SpanRecord; units: UnitSystem }) {
  const wires = records.wire.filter((wire) => wire.spanId === span.id);
  if (wires.length === 0) return <p class="muted small">No wire positions yet.</p>;
  return (
    <ul class="wire-results">
      {wires.map((wire) => {
        const reading = latestReading(records, wire.id);
        if (!reading) {
          return (
            <li key={wire.id}>
              <span class="wire-results__label">{wire.label}</span>
              <span class="muted">no reading yet</span>
            </li>
          );
        }
        const solved = solveReading(readingContext(records, reading));
        return (
          <li key={wire.id}>
            <span class="wire-results__label">{wire.label}</span>
            <span>
              <WireVerdict records={records} wireId={wire.id} />{' '}
              {solved.ok ? (
                <span class="wire-results__figures">
                  <span class="nowrap">H {show(solved.solution.horizontalTension, 'tension', units)}</span>
                  {' · '}
                  <span class="nowrap">sag {show(solved.solution.midspanSag, 'sag', units)}</span>
                </span>
              ) : (
                <Badge tone="bad">cannot solve</Badge>
              )}
              <span class="wire-results__method muted small">{methodTitle(reading.measurement.method)}</span>
            </span>
          </li>
        );
      })}
    </ul>
  );
}

export function LineScreen({ lineId }: { lineId: string }) {
  const data = useData();
  const [loaded, reload] = useLineRecords(lineId);
  if (loaded.state === 'loading') return <p class="muted">Opening the line…</p>;
  if (loaded.state === 'failed')
    return <p class="error-text">This line could not be read: {loaded.message}</p>;
  const records = loaded.value;
  const line = records?.line[0];
  if (!records || !line) {
    return (
      <p class="empty">
        This line is not on this phone. <a href={href()}>Back to lines</a>
      </p>
    );
  }
  const units = line.unitSystem;
  const sections = [...records.section].sort((a, b) => a.name.localeCompare(b.name));

  return (
    <section>
      <Crumbs items={[{ label: 'Lines', to: href() }]} />
      <div class="line-head">
        <h1>{line.name}</h1>
        <Badge tone="info">{units === 'us' ? 'US customary units' : 'Metric units'}</Badge>
      </div>
      {line.owner && <p class="muted">Owner: {line.owner}</p>}
      <div class="btn-row">
        <LinkButton href={href('line', line.id, 'settings')}>Line settings and units</LinkButton>
        {/* The files block sits under the last section; a long line needs a way straight to it. */}
        <Button onClick={() => document.getElementById(FILES_BLOCK_ID)?.scrollIntoView({ block: 'start' })}>
          Report and files ↓
        </Button>
      </div>

      {sections.length === 0 && (
        <p class="empty">
          Start with a tension section: the run of spans between two dead-ends that share one conductor.
        </p>
      )}

      {sections.map((section) => {
        const spans = records.span
          .filter((span) => span.sectionId === section.id)
          .sort(
            (a, b) => structureOrder(records, a.nearStructureId) - structureOrder(records, b.nearStructureId),
          );
        const ruling = spans.length > 0 ? rulingSpan(spans.map((span) => span.length)) : undefined;
        return (
          <article class="section-block" key={section.id} aria-label={`Tension section ${section.name}`}>
            <header class="section-block__head">
              <div>
                <h2>{section.name}</h2>
                <p class="muted small">
                  Conductor: <strong>{section.conductor.name}</strong> · {spans.length} span
                  {spans.length === 1 ? '' : 's'}
                  {ruling !== undefined && <> · ruling span {show(ruling, 'length', units)}</>}
                </p>
              </div>
              <LinkButton href={href('line', line.id, 'section', section.id)}>Edit section</LinkButton>
            </header>
            <LineSectionSummary records={records} sectionId={section.id} />
            <ul class="list">
              {spans.map((span) => {
                const rise = wireGeometry(span, undefined).geometry.rise;
                return (
                  <li key={span.id}>
                    <a class="span-card" href={href('line', line.id, 'span', span.id)}>
                      <span class="span-card__title">
                        Span {structureLabel(records, span.nearStructureId)} →{' '}
                        {structureLabel(records, span.farStructureId)}
                      </span>
                      <span class="span-card__geometry muted">
                        {show(span.length, 'length', units)} · rise {show(rise, 'length', units)}
                      </span>
                      <WireSummary records={records} span={span} units={units} />
                    </a>
                  </li>
                );
              })}
            </ul>
            <div class="btn-row">
              <LinkButton
                look="primary"
                href={`${href('line', line.id, 'span', 'new')}?section=${section.id}`}
              >
                + Add span
              </LinkButton>
            </div>
          </article>
        );
      })}
      <div class="btn-row">
        <LinkButton
          look={sections.length === 0 ? 'primary' : 'plain'}
          href={href('line', line.id, 'section', 'new')}
        >
          + Add tension section
        </LinkButton>
      </div>
      <div id={FILES_BLOCK_ID}>
        <ExportPanel
          store={data.files}
          input={lineLogInput(records, line)}
          now={() => new Date().toISOString()}
          newId={() => crypto.randomUUID()}
          onShowReport={() => navigate(href('line', line.id, 'report'))}
          onImported={reload}
        />
      </div>
    </section>
  );
}
