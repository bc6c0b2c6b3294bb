// Files for everything on this phone: one inspection log of every line, a backup of every line, and restoring
// a backup (from this phone or another). After a restore the lines list reloads. The export code loads on first
// use, so the start screen stays small.
import type { LineRecord } from '../../../core/records/line';
import type { UnitSystem } from '../../../core/units';
import { useData } from '../../app/context';
import { Button } from '../../components/button/Button';
import { ExportStatusLine } from '../../exports/ExportStatusLine';
import { useExportRun } from '../../exports/use-export-run';
import '../../exports/export-panel.css';

/** One CSV has one set of units: US customary only when every line uses it, metric otherwise. */
function logUnits(lines: readonly LineRecord[]): UnitSystem {
  return lines.length > 0 && lines.every((line) => line.unitSystem === 'us') ? 'us' : 'metric';
}

export function AllLinesFiles({
  lines,
  onImported,
}: {
  lines: readonly LineRecord[];
  onImported: () => void;
}) {
  const data = useData();
  const exportRun = useExportRun();
  const { busy, run } = exportRun;
  const now = (): string => new Date().toISOString();
  const hasLines = lines.length > 0;
  const units = logUnits(lines);
  const mixed = lines.some((line) => line.unitSystem !== units);

  const onBackupFile = (event: Event): void => {
    const field = event.currentTarget as HTMLInputElement;
    const file = field.files?.[0];
    field.value = '';
    if (!file) return;
    void run('Restoring the backup', async () => {
      const { importBackupFile } = await import('../../exports/actions');
      const outcome = await importBackupFile(data.files, file);
      if (!outcome.ok) throw new Error(outcome.message);
      onImported();
      return `Backup restored: ${outcome.written} records added or updated, ${outcome.unchanged} already up to date.`;
    });
  };

  return (
    <section class="export-panel" aria-label="Files for all lines">
      <h2 class="export-panel__title">{hasLines ? 'All lines: files and backups' : 'Bring in a backup'}</h2>
      {hasLines ? (
        <div class="export-panel__actions">
          <Button
            disabled={busy}
            onClick={() =>
              void run('Building the inspection log of all lines', async (onProgress) => {
                const [{ downloadAllInspectionLogs }, { allLinesLogInputs }, { records }] = await Promise.all(
                  [import('../../exports/actions'), import('../../app/log-input'), data.files.exportAll()],
                );
                await downloadAllInspectionLogs(allLinesLogInputs(records), units, now(), { onProgress });
                return mixed
                  ? 'Inspection log of all lines saved (CSV), every line in metric units.'
                  : 'Inspection log of all lines saved (CSV).';
              })
            }
          >
            Inspection log of all lines (CSV)
          </Button>
          <Button
            disabled={busy}
            onClick={() =>
              void run('Building the backup', async (onProgress) => {
                const { downloadBackup } = await import('../../exports/actions');
                await downloadBackup(data.files, now(), { onProgress });
                return 'Backup of all lines saved (JSON).';
              })
            }
          >
            Backup of all lines (JSON)
          </Button>
        </div>
      ) : null}
      <div class="export-panel__imports">
        <label class="export-panel__file">
          <span>Restore from a backup (JSON)</span>
          <input type="file" accept=".json,application/json" disabled={busy} onChange={onBackupFile} />
        </label>
      </div>
      <ExportStatusLine run={exportRun} />
    </section>
  );
}
