// Runs one export or import at a time for a panel: a status line to show, and progress that appears only when
// the work takes longer than a second (shorter work would only flicker).
import { useEffect, useRef, useState } from 'preact/hooks';
import type { ExportProgress } from './download';

/** Progress shows only for work that takes longer than this, ms (the issue: "beyond a second"). */
export const PROGRESS_DELAY_MS = 1000;

export type ExportStatus =
  { kind: 'idle' } | { kind: 'busy'; label: string } | { kind: 'done' | 'failed'; message: string };

export interface ExportRun {
  status: ExportStatus;
  busy: boolean;
  /** The progress to draw, or undefined while hidden. */
  progress: ExportProgress | undefined;
  /** Starts `work` unless something is running; its resolved text becomes the "done" message. */
  run: (
    label: string,
    work: (onProgress: (progress: ExportProgress) => void) => Promise<string>,
  ) => Promise<void>;
}

export function useExportRun(): ExportRun {
  const [status, setStatus] = useState<ExportStatus>({ kind: 'idle' });
  const [progress, setProgress] = useState<ExportProgress | undefined>(undefined);
  const [showProgress, setShowProgress] = useState(false);
  const timer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  const running = useRef(false);
  useEffect(() => () => clearTimeout(timer.current), []);

  async function run(
    label: string,
    work: (onProgress: (progress: ExportProgress) => void) => Promise<string>,
  ): Promise<void> {
    if (running.current) return;
    running.current = true;
    setStatus({ kind: 'busy', label });
    setProgress(undefined);
    setShowProgress(false);
    timer.current = setTimeout(() => setShowProgress(true), PROGRESS_DELAY_MS);
    try {
      const message = await work(setProgress);
      setStatus({ kind: 'done', message });
    } catch (error) {
      setStatus({ kind: 'failed', message: error instanceof Error ? error.message : String(error) });
    } finally {
      clearTimeout(timer.current);
      setShowProgress(false);
      running.current = false;
    }
  }

  return { status, busy: status.kind === 'busy', progress: showProgress ? progress : undefined, run };
}
