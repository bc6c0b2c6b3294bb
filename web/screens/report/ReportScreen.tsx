// The printable report of one line: the report itself (web/exports/PrintReport, which has the "Print / save as
// PDF" button) under a way back to the line. On paper only the report prints.
import { useMemo } from 'preact/hooks';
import { useLineRecords } from '../../app/context';
import { userLocale } from '../../app/format';
import { lineLogInput } from '../../app/log-input';
import { href } from '../../app/router';
import { Crumbs } from '../../components/crumbs/Crumbs';
import { PrintReport } from '../../exports/PrintReport';

export function ReportScreen({ lineId }: { lineId: string }) {
  const [loaded] = useLineRecords(lineId);
  // Fixed when the screen opens, so the heading does not change while someone reads it.
  const preparedAt = useMemo(() => new Date().toISOString(), []);
  if (loaded.state === 'loading') return <p class="muted">Preparing the report…</p>;
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
  const locale = userLocale();
  return (
    <section>
      <Crumbs
        items={[
          { label: 'Lines', to: href() },
          { label: line.name, to: href('line', line.id) },
        ]}
      />
      <PrintReport
        lines={[lineLogInput(records, line)]}
        preparedAt={preparedAt}
        {...(locale === undefined ? {} : { locale })}
      />
    </section>
  );
}
