/**
 * The export and import actions a screen calls: each builds its file in slices (the screen stays responsive and
 * can show progress), then hands it to the browser's download; imports validate everything before writing.
 */
import {
  type BackupParseResult,
  type CsvWriteOptions,
  type InspectionLogInput,
  type RecordSet,
  type SpanListImportOptions,
  type SpanListPreview,
  type UnitSystem,
  CSV_BYTE_ORDER_MARK,
  DEFAULT_CSV_BYTE_ORDER_MARK,
  GEOJSON_MEDIA_TYPE,
  backupJsonJob,
  csvRecord,
  inspectionLogHeader,
  inspectionLogJob,
  lineGeoJson,
  parseBackup,
  previewSpanList,
  spanListTemplate,
} from '../../core';
import {
  type ChunkedRunOptions,
  MEDIA_TYPES,
  collectInSlices,
  downloadText,
  exportFileName,
} from './download';

/** The storage calls the exports need (web/storage's SpanlogStore has them). */
export interface ExportStore {
  exportAll(): Promise<{ records: RecordSet }>;
  exportLine(lineId: string): Promise<{ records: RecordSet }>;
  putRaw(batch: Partial<RecordSet>): Promise<{ written: number; unchanged: number }>;
}

/** The date part of an ISO time, for file names ("2026-05-14"). */
function day(iso: string): string {
  return iso.slice(0, 10);
}

/** Builds the inspection log CSV of a line in slices and downloads it. */
export async function downloadInspectionLog(
  input: InspectionLogInput,
  now: string,
  options: CsvWriteOptions & ChunkedRunOptions = {},
): Promise<void> {
  const job = inspectionLogJob(input, options);
  const parts = await collectInSlices(job.parts, job.total, options);
  downloadText(parts, exportFileName(input.line.name, `inspection-log-${day(now)}`, 'csv'), MEDIA_TYPES.csv);
}

/**
 * Builds one inspection log of several lines and downloads it. A CSV has one header, so every row is written in
 * `system` (the caller picks it; lines kept in the other system are converted, and the header names the units).
 */
export async function downloadAllInspectionLogs(
  inputs: readonly InspectionLogInput[],
  system: UnitSystem,
  now: string,
  options: CsvWriteOptions & ChunkedRunOptions = {},
): Promise<void> {
  const withMark = options.byteOrderMark ?? DEFAULT_CSV_BYTE_ORDER_MARK;
  const jobs = inputs.map((input) =>
    inspectionLogJob(
      { ...input, line: { ...input.line, unitSystem: system } },
      { ...options, byteOrderMark: false },
    ),
  );
  function* parts(): Generator<string> {
    yield (withMark ? CSV_BYTE_ORDER_MARK : '') + csvRecord(inspectionLogHeader(system));
    for (const job of jobs) {
      let header = true;
      for (const part of job.parts) {
        if (!header) yield part;
        header = false;
      }
    }
  }
  // Each job's total counts its header piece; the file has one header.
  const total = 1 + jobs.reduce((sum, job) => sum + job.total - 1, 0);
  const collected = await collectInSlices(parts(), total, options);
  downloadText(collected, exportFileName('all-lines', `inspection-log-${day(now)}`, 'csv'), MEDIA_TYPES.csv);
}

/** Downloads the JSON backup of one line (with lineId) or of everything (without). */
export async function downloadBackup(
  store: ExportStore,
  now: string,
  options: ChunkedRunOptions & { lineId?: string; lineName?: string } = {},
): Promise<void> {
  const { records } =
    options.lineId === undefined ? await store.exportAll() : await store.exportLine(options.lineId);
  const job = backupJsonJob(records, now);
  const parts = await collectInSlices(job.parts, job.total, options);
  const name =
    options.lineId === undefined ? 'all-lines' : (options.lineName ?? records.line[0]?.name ?? 'line');
  downloadText(parts, exportFileName(name, `backup-${day(now)}`, 'json'), MEDIA_TYPES.json);
}

/** Downloads the GeoJSON of a line (structures and spans with positions). */
export function downloadGeoJson(input: InspectionLogInput, now: string): void {
  const text = JSON.stringify(lineGeoJson(input), null, 1);
  downloadText(text, exportFileName(input.line.name, `map-${day(now)}`, 'geojson'), GEOJSON_MEDIA_TYPE);
}

/** Downloads the span-list template in the line's units. */
export function downloadSpanListTemplate(system: 'metric' | 'us'): void {
  downloadText(spanListTemplate(system), `span-list-template-${system}.csv`, MEDIA_TYPES.csv);
}

export type BackupImportOutcome =
  | { ok: true; written: number; unchanged: number; lineIds: string[] }
  | { ok: false; message: string; parse?: Extract<BackupParseResult, { ok: false }> };

/**
 * Reads a backup file and applies it: everything is validated first (nothing is written when any record is
 * invalid), then storage merges all records by id and revision in one transaction, so a second import of the
 * same file writes nothing.
 */
export async function importBackupFile(
  store: ExportStore,
  file: Blob | string,
): Promise<BackupImportOutcome> {
  const text = typeof file === 'string' ? file : await file.text();
  const parsed = parseBackup(text);
  if (!parsed.ok) return { ok: false, message: parsed.problem.message, parse: parsed };
  try {
    const { written, unchanged } = await store.putRaw(parsed.records);
    return { ok: true, written, unchanged, lineIds: parsed.lineIds };
  } catch (error) {
    const detail = error instanceof Error ? error.message : String(error);
    return { ok: false, message: `The backup could not be stored (${detail}). Nothing was imported.` };
  }
}

/** Reads a span-list file into a preview (nothing written). */
export async function previewSpanListFile(
  file: Blob | string,
  options: SpanListImportOptions,
): Promise<SpanListPreview> {
  const text = typeof file === 'string' ? file : await file.text();
  return previewSpanList(text, options);
}

/** Writes the records of a previewed span list (only when the preview has no errors). */
export async function applySpanList(
  store: ExportStore,
  preview: SpanListPreview,
): Promise<{ written: number; unchanged: number }> {
  if (!preview.ok) throw new Error('The span list has errors; fix them before importing.');
  return store.putRaw(preview.records);
}
