/**
 * Browser side of the exports: save a file through the browser's download, and build a large export in slices
 * so the screen keeps answering taps and can show progress.
 */

/** Media types of the files we write. */
export const MEDIA_TYPES = {
  csv: 'text/csv;charset=utf-8',
  json: 'application/json',
  geojson: 'application/geo+json',
} as const;

/**
 * Saves `blob` as `fileName` through a temporary link with the `download` attribute and an object URL.
 * The URL is revoked on the next turn of the event loop, after the browser has started the download.
 */
export function downloadBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.rel = 'noopener';
  link.style.display = 'none';
  document.body.append(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 0);
}

/** Saves text (or text pieces, joined without copying into one big string first) as a file. */
export function downloadText(parts: string | readonly string[], fileName: string, mediaType: string): void {
  const pieces = typeof parts === 'string' ? [parts] : [...parts];
  downloadBlob(new Blob(pieces, { type: mediaType }), fileName);
}

/** A file name safe on every common file system: the line's name, a suffix and an extension. */
export function exportFileName(lineName: string, suffix: string, extension: string): string {
  const visible = [...lineName.normalize('NFC')]
    .map((char) => (char.charCodeAt(0) < 0x20 ? '-' : char))
    .join('');
  const base = visible
    .replace(/\s*[\\/:*?"<>|]+\s*/g, '-')
    .replace(/\s+/g, ' ')
    .replace(/-{2,}/g, '-')
    .replace(/^[\s.-]+|[\s.-]+$/g, '')
    .slice(0, 80);
  return `${base || 'spanlog'}-${suffix}.${extension}`;
}

/** Gives the browser a chance to paint and handle input: `scheduler.yield()` where it exists, else a 0 ms timer. */
export function yieldToBrowser(): Promise<void> {
  const scheduler = (globalThis as { scheduler?: { yield?: () => Promise<void> } }).scheduler;
  if (scheduler?.yield) return scheduler.yield();
  return new Promise((resolve) => setTimeout(resolve, 0));
}

export interface ExportProgress {
  /** Units of work done (e.g. rows). */
  done: number;
  total: number;
}

export interface ChunkedRunOptions {
  /** Called after each slice and once at the end. */
  onProgress?: (progress: ExportProgress) => void;
  /** Stop early (the promise rejects with the signal's reason). */
  signal?: AbortSignal;
  /** Longest stretch of work between yields, ms; default {@link DEFAULT_SLICE_MS} (under one 60 Hz frame). */
  sliceMs?: number;
}

/** Work between yields: short enough to stay under a frame, long enough that yielding costs little. */
export const DEFAULT_SLICE_MS = 12;

/**
 * Drains `pieces` (typically a generator that builds one row per step) into an array, yielding to the browser
 * every `sliceMs` and reporting progress against `total`. The result is ready for {@link downloadText}.
 */
export async function collectInSlices<T>(
  pieces: Iterable<T>,
  total: number,
  options: ChunkedRunOptions = {},
): Promise<T[]> {
  const sliceMs = options.sliceMs ?? DEFAULT_SLICE_MS;
  const collected: T[] = [];
  let sliceStart = performance.now();
  for (const piece of pieces) {
    collected.push(piece);
    if (performance.now() - sliceStart >= sliceMs) {
      options.onProgress?.({ done: Math.min(collected.length, total), total });
      await yieldToBrowser();
      options.signal?.throwIfAborted();
      sliceStart = performance.now();
    }
  }
  options.onProgress?.({ done: total, total });
  return collected;
}
