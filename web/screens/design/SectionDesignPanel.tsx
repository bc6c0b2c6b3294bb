// The design basis of a saved section, as a panel for the section screen: the form, saving through the app's
// data layer (validated by storage), then telling the screen to reload.
import { useState } from 'preact/hooks';
import type { RecordSet } from '../../../core/records/kinds';
import type { SectionRecord } from '../../../core/records/section';
import { useData } from '../../app/context';
import { DesignBasisForm } from './DesignBasisForm';

export function SectionDesignPanel({
  records,
  section,
  onSaved,
}: {
  records: RecordSet;
  section: SectionRecord;
  /** Called after a successful save (reload the records there). */
  onSaved?: () => void;
}) {
  const data = useData();
  const [saved, setSaved] = useState(false);
  const units = records.line[0]?.unitSystem ?? 'metric';
  return (
    <section class="design-panel" aria-label="Design basis">
      <h2>Design basis</h2>
      <p class="muted">
        What this section was designed to: the verdicts of its wires compare each reading with it.
      </p>
      <DesignBasisForm
        key={`${section.id}:${section.revision}`}
        section={section}
        spans={records.span}
        unitSystem={units}
        onSave={async (design) => {
          await data.save('section', { ...section, design });
          setSaved(true);
          onSaved?.();
        }}
      />
      {saved && (
        <p class="restored" role="status">
          Design basis saved.
        </p>
      )}
    </section>
  );
}
