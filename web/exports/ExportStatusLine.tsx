// The status line under a files panel: what is running (with progress once it takes over a second), then the
// outcome. A live region, so a screen reader hears it too.
import type { ExportRun } from './use-export-run';

export function ExportStatusLine({ run }: { run: ExportRun }) {
  const { status, progress } = run;
  return (
    <div class="export-panel__status" role="status" aria-live="polite">
      {status.kind === 'busy' ? (
        <p>
          {status.label}…
          {progress ? (
            <progress class="export-panel__progress" max={progress.total} value={progress.done} />
          ) : null}
        </p>
      ) : null}
      {status.kind === 'done' ? <p class="export-panel__done">{status.message}</p> : null}
      {status.kind === 'failed' ? <p class="export-panel__failed">{status.message}</p> : null}
    </div>
  );
}
