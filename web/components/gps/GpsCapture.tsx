// "Capture GPS" button with the captured position or the reason it failed.
import { useState } from 'preact/hooks';
import type { GeoPosition } from '../../../core/records/common';
import { capturePosition, describePosition } from '../../app/geolocation';
import { Button } from '../button/Button';

interface GpsCaptureProps {
  label: string;
  position: GeoPosition | undefined;
  onCapture: (position: GeoPosition | undefined) => void;
}

export function GpsCapture({ label, position, onCapture }: GpsCaptureProps) {
  const [state, setState] = useState<{ busy: boolean; error: string | null }>({ busy: false, error: null });
  const capture = async (): Promise<void> => {
    setState({ busy: true, error: null });
    const result = await capturePosition();
    if (result.ok) {
      onCapture(result.position);
      setState({ busy: false, error: null });
    } else {
      setState({ busy: false, error: result.message });
    }
  };
  return (
    <div class="field">
      <span class="field__label">{label}</span>
      {position && <span class="value small">{describePosition(position)}</span>}
      <div class="row">
        <Button onClick={() => void capture()} disabled={state.busy}>
          {state.busy ? 'Waiting for GPS…' : position ? 'Capture again' : 'Capture GPS position'}
        </Button>
        {position && (
          <Button look="quiet" onClick={() => onCapture(undefined)}>
            Clear
          </Button>
        )}
      </div>
      {state.error && (
        <span class="field__message" role="alert">
          {state.error}
        </span>
      )}
    </div>
  );
}
