// The "files" panel of a line: export the inspection log, backups and the map; open the printable report;
// restore a backup; prepare structures from a span list with a preview. Work runs in slices and a progress bar
// appears when it takes longer than a second.
import { useState } from 'preact/hooks';
import { type InspectionLogInput, type SpanListPreview, type UnitSystem, formatQuantity } from '../../core';
import { Button } from '../components/button/Button';
import {
  type ExportStore,
  applySpanList,
  downloadBackup,
  downloadGeoJson,
  downloadInspectionLog,
  downloadSpanListTemplate,
  importBackupFile,
  previewSpanListFile,
} from './actions';
import { ExportStatusLine } from './ExportStatusLine';
import { useExportRun } from './use-export-run';
import './export-panel.css';

export interface ExportPanelProps {
  /** Storage (web/storage's SpanlogStore fits). */
  store: ExportStore & { deviceId(): string };
  /** The line's records and the result function, as for the inspection log. */
  input: InspectionLogInput;
  /** Current time, ISO 8601 (file names, backup stamp, new records). */
  now: () => string;
  /** A fresh UUID for records created by a span-list import. */
  newId: () => string;
  /** Opens the printable report (the app's route for it). */
  onShowReport?: () => void;
  /** Called after an import wrote records, so the screen can reload. */
  onImported?: () => void;
}

export function ExportPanel({ store, input, now, newId, onShowReport, onImported }: ExportPanelProps) {
  const exportRun = useExportRun();
  const { busy, run } = exportRun;
  const [preview, setPreview] = useState<SpanListPreview | undefined>(undefined);

  const lineName = input.line.name;

  const onBackupFile = (event: Event) => {
    const field = event.currentTarget as HTMLInputElement;
    const file = field.files?.[0];
    field.value = '';
    if (!file) return;
    void run('Restoring the backup', async () => {
      const outcome = await importBackupFile(store, file);
      if (!outcome.ok) throw new Error(outcome.message);
      onImported?.();
      return `Backup restored: ${outcome.written} records added or updated, ${outcome.unchanged} already up to date.`;
    });
  };

  const onSpanListFile = (event: Event) => {
    const field = event.currentTarget as HTMLInputElement;
    const file = field.files?.[0];
    field.value = '';
    if (!file) return;
    void run('Reading the span list', async () => {
      const result = await previewSpanListFile(file, {
        line: input.line,
        existingSections: input.sections.filter((section) => section.lineId === input.line.id),
        existingStructures: input.structures.filter((structure) => structure.lineId === input.line.id),
        deviceId: store.deviceId(),
        now: now(),
        newId,
      });
      setPreview(result);
      return result.ok
        ? 'Check the preview below, then add the structures.'
        : `The span list has ${result.errors.length} problem(s); nothing was added.`;
    });
  };

  const applyPreview = () => {
    const current = preview;
    if (!current?.ok) return;
    void run('Adding structures and spans', async () => {
      const { written } = await applySpanList(store, current);
      setPreview(undefined);
      onImported?.();
      return `Added ${written} records from the span list.`;
    });
  };

  return (
    <section class="export-panel" aria-label="Files for this line">
      <h2 class="export-panel__title">Report, files and backups</h2>
      <div class="export-panel__actions">
        <Button
          look="primary"
          disabled={busy}
          onClick={() =>
            void run('Building the inspection log', async (onProgress) => {
              await downloadInspectionLog(input, now(), { onProgress });
              return 'Inspection log saved (CSV).';
            })
          }
        >
          Inspection log (CSV)
        </Button>
        {onShowReport ? (
          <Button disabled={busy} onClick={onShowReport}>
            Printable report
          </Button>
        ) : null}
        <Button
          disabled={busy}
          onClick={() =>
            void run('Building the map', () => {
              downloadGeoJson(input, now());
              return Promise.resolve('Map saved (GeoJSON).');
            })
          }
        >
          Map (GeoJSON)
        </Button>
        <Button
          disabled={busy}
          onClick={() =>
            void run('Building the backup', async (onProgress) => {
              await downloadBackup(store, now(), { lineId: input.line.id, lineName, onProgress });
              return 'Backup of this line saved (JSON).';
            })
          }
        >
          Backup of this line (JSON)
        </Button>
        <Button
          disabled={busy}
          onClick={() =>
            void run('Building the backup', async (onProgress) => {
              await downloadBackup(store, now(), { onProgress });
              return 'Backup of all lines saved (JSON).';
            })
          }
        >
          Backup of all lines (JSON)
        </Button>
      </div>

      <div class="export-panel__imports">
        <label class="export-panel__file">
          <span>Restore from a backup (JSON)</span>
          <input type="file" accept=".json,application/json" disabled={busy} onChange={onBackupFile} />
        </label>
        <label class="export-panel__file">
          <span>Add structures from a span list (CSV)</span>
          <input type="file" accept=".csv,text/csv" disabled={busy} onChange={onSpanListFile} />
        </label>
        <Button look="quiet" disabled={busy} onClick={() => downloadSpanListTemplate(input.line.unitSystem)}>
          Span-list template
        </Button>
      </div>

      <ExportStatusLine run={exportRun} />

      {preview ? (
        <SpanListPreviewTable
          preview={preview}
          system={input.line.unitSystem}
          busy={busy}
          onApply={applyPreview}
          onCancel={() => setPreview(undefined)}
        />
      ) : null}
    </section>
  );
}

function lengthText(metres: number | undefined, system: UnitSystem): string {
  if (metres === undefined) return '—';
  const { value, unit } = formatQuantity(metres, 'length', system);
  return `${value} ${unit}`;
}

function SpanListPreviewTable({
  preview,
  system,
  busy,
  onApply,
  onCancel,
}: {
  preview: SpanListPreview;
  system: UnitSystem;
  busy: boolean;
  onApply: () => void;
  onCancel: () => void;
}) {
  const errorsByRow = new Map<number, string[]>();
  for (const error of preview.errors)
    errorsByRow.set(error.row, [...(errorsByRow.get(error.row) ?? []), error.message]);
  const headerErrors = errorsByRow.get(1) ?? [];
  return (
    <div class="export-panel__preview">
      <h3>Span-list preview</h3>
      {headerErrors.length > 0 ? (
        <ul class="export-panel__failed">
          {headerErrors.map((message) => (
            <li key={message}>{message}</li>
          ))}
        </ul>
      ) : null}
      <table>
        <thead>
          <tr>
            <th scope="col">Row</th>
            <th scope="col">Structure</th>
            <th scope="col">Span from previous</th>
            <th scope="col">Section / conductor</th>
            <th scope="col">Problems</th>
          </tr>
        </thead>
        <tbody>
          {preview.rows.map((row) => (
            <tr key={row.row} class={errorsByRow.has(row.row) ? 'export-panel__bad-row' : undefined}>
              <td>{row.row}</td>
              <td>{row.structure}</td>
              <td>{lengthText(row.spanLength, system)}</td>
              <td>{[row.section, row.conductor].filter(Boolean).join(' / ')}</td>
              <td>{(errorsByRow.get(row.row) ?? []).join(' ')}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p>
        {preview.ok
          ? `Ready to add ${preview.counts.structures} structures, ${preview.counts.spans} spans, ${preview.counts.sections} new sections and ${preview.counts.wires} wire positions.`
          : 'Fix the rows marked above in the file and choose it again. Nothing has been added.'}
      </p>
      <div class="export-panel__actions">
        {preview.ok ? (
          <Button look="primary" disabled={busy} onClick={onApply}>
            Add to this line
          </Button>
        ) : null}
        <Button look="quiet" disabled={busy} onClick={onCancel}>
          Close preview
        </Button>
      </div>
    </div>
  );
}
