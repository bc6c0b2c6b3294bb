// Return-wave entry: the contact caution first, then the tap timer, then N returns in T seconds by hand.
import type { DraftHandle } from '../../app/drafts';
import { userLocale } from '../../app/format';
import { Caution } from '../../components/caution/Caution';
import { NumberField } from '../../components/field/NumberField';
import { TapTimer } from '../../components/tap-timer';
import { tapsFromText, tapsToText } from './reading-form';

export function ReturnWavePanel({
  draft,
  errors,
}: {
  draft: DraftHandle;
  errors: Record<string, string | null>;
}) {
  const values = draft.values ?? {};
  const taps = tapsFromText(values.taps);
  return (
    <div>
      <TapTimer
        initialTaps={tapsFromText(values.pendingTaps)}
        // Taps are kept in the draft as they come, so a reload mid-timing loses none of them.
        onTapsChange={(pending) => {
          const text = tapsToText(pending);
          if (text !== (values.pendingTaps ?? '')) draft.setMany({ pendingTaps: text });
        }}
        onDone={(result) =>
          draft.setMany({
            taps: tapsToText(result.taps),
            returns: String(result.returns),
            // Typed back in the user's decimal separator so the field reads it like anything typed by hand.
            seconds: result.seconds.toLocaleString(userLocale(), {
              maximumFractionDigits: 3,
              useGrouping: false,
            }),
          })
        }
      >
        <Caution title="Before you strike the wire">
          <p>
            Only strike or jerk a conductor that is de-energized, tested and grounded under your employer's
            rules, or use approved live-line tools as a qualified worker. Nearby circuits can induce voltage
            on a dead wire. Near energized lines, prefer a method that does not touch the wire (sag, sight or
            surveyed points).
          </p>
        </Caution>
      </TapTimer>
      {taps && taps.length > 1 && (
        <p class="taps-used" role="status">
          Taps in use: {taps.length - 1} returns. The count and time below came from them; edit them if
          needed.
        </p>
      )}
      <h3>Count and time</h3>
      <p class="muted small">Or, with a stopwatch: count N returns and the time T they took.</p>
      <div class="grid-2">
        <NumberField
          id="reading-returns"
          label="Returns counted (N)"
          integer
          value={values.returns ?? ''}
          onInput={(text) => draft.setMany({ returns: text, taps: '' })}
          error={errors.returns}
        />
        <NumberField
          id="reading-seconds"
          label="Time for N returns (T)"
          unit="s"
          value={values.seconds ?? ''}
          onInput={(text) => draft.setMany({ seconds: text, taps: '' })}
          error={errors.seconds}
        />
      </div>
    </div>
  );
}
