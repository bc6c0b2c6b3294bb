// Surveyed points: instrument shots entered with the shot list, kept in the draft as JSON text so a reload
// reopens them.
import { useState } from 'preact/hooks';
import type { UnitSystem } from '../../../core/units';
import type { DraftHandle } from '../../app/drafts';
import { userLocale } from '../../app/format';
import { ShotList } from '../../components/shots';
import { pointsFromShotsText } from './shots-glue';

export function ShotsPanel({
  draft,
  error,
  units,
  span,
}: {
  draft: DraftHandle;
  error: string | null;
  units: UnitSystem;
  span: number;
}) {
  // Read the saved shots once: the list owns its rows afterwards and reports every change.
  const [initialShots] = useState(() => pointsFromShotsText(draft.values?.shots).shots);
  return (
    <div>
      <ShotList
        unitSystem={units}
        locale={userLocale()}
        span={span}
        {...(initialShots ? { initialShots } : {})}
        onChange={(value) => draft.set('shots', value.shots.length > 0 ? JSON.stringify(value.shots) : '')}
      />
      {error && (
        <p class="field__message" role="alert">
          {error}
        </p>
      )}
    </div>
  );
}
