import type { ComponentChildren } from 'preact';
import { useEffect, useState } from 'preact/hooks';
import { SpanInputError } from '../../../core/errors';
import { fitTapPeriod, type TapFit } from '../../../core/return-wave-taps';
import { formatQuantity } from '../../../core/units';
import './TapTimer.css';

/** What the timer hands back when the user accepts the taps. */
export interface TapTimerResult {
  /** Tap times, s from the strike: the strike itself first (0), then each return. */
  taps: number[];
  /** Number of returns tapped. */
  returns: number;
  /** Fitted time for all returns, s (returns × fitted period). */
  seconds: number;
}

export interface TapTimerProps {
  /** Called with the taps when the user presses "Use these taps". */
  onDone: (result: TapTimerResult) => void;
  /** Clock in milliseconds; performance.now() when absent (tests inject their own). */
  now?: () => number;
  /** Fewest returns before the taps can be used; 2 when absent (one return has no spread). */
  minimumReturns?: number;
  /** Taps (s from the strike) kept from before a reload; shown and usable, and a new tap starts a new series. */
  initialTaps?: readonly number[];
  /** Called with the taps (s from the strike) whenever they change, so the screen can keep them in its draft. */
  onTapsChange?: (taps: number[]) => void;
  /** Shown above the tap button: the screen puts its contact caution here. */
  children?: ComponentChildren;
}

const DEFAULT_MINIMUM_RETURNS = 2;

function seconds(value: number, decimals = 3): string {
  const shown = formatQuantity(value, 'time', 'metric', { decimals });
  return `${shown.value} ${shown.unit}`;
}

/**
 * Return-wave tap timer: one very large button, tapped at the strike and at every return felt. Shows the count,
 * the fitted period and its spread; undo, start again, and hand the taps over.
 */
export function TapTimer({
  onDone,
  now,
  minimumReturns,
  initialTaps,
  onTapsChange,
  children,
}: TapTimerProps) {
  const clock = now ?? (() => performance.now());
  const needed = minimumReturns ?? DEFAULT_MINIMUM_RETURNS;
  // Clock readings, ms; converted to seconds from the strike for the fit. Restored taps count from 0.
  const [stamps, setStamps] = useState<number[]>(() => (initialTaps ?? []).map((t) => t * 1000));
  // Restored taps belong to a wave long gone: the next tap starts a new series rather than extending them.
  const [restored, setRestored] = useState(() => (initialTaps?.length ?? 0) > 0);

  const record = (): void => {
    const at = clock();
    setStamps((previous) => (restored ? [at] : [...previous, at]));
    setRestored(false);
  };
  const strike = stamps[0];
  const taps = strike === undefined ? [] : stamps.map((t) => (t - strike) / 1000);
  useEffect(() => onTapsChange?.(taps), [stamps]);
  let fit: TapFit | undefined;
  let problem: string | undefined;
  if (taps.length >= 2) {
    try {
      fit = fitTapPeriod(taps);
    } catch (error) {
      if (!(error instanceof SpanInputError)) throw error;
      problem = error.message;
    }
  }
  const returns = Math.max(0, taps.length - 1);
  const ready = fit !== undefined && returns >= needed;

  const prompt = taps.length === 0 ? 'Tap at the strike' : `Tap at return ${returns + 1}`;

  return (
    <section class="tap-timer" aria-label="Return-wave tap timer">
      {children !== undefined && <div class="tap-timer__caution">{children}</div>}
      <button
        type="button"
        class="tap-timer__tap"
        onPointerDown={(event) => {
          if (event.button !== 0) return;
          // Record on contact, not on release: the release adds the finger's own delay.
          event.preventDefault();
          record();
        }}
        onKeyDown={(event) => {
          if ((event.key === ' ' || event.key === 'Enter') && !event.repeat) {
            event.preventDefault();
            record();
          }
        }}
      >
        <span class="tap-timer__tap-main">{prompt}</span>
        <span class="tap-timer__tap-hint">
          {taps.length === 0 ? 'then tap at every return you feel' : 'tap each time the wave comes back'}
        </span>
      </button>

      <dl class="tap-timer__readout" aria-live="polite">
        <div>
          <dt>Taps</dt>
          <dd data-testid="tap-count">{taps.length}</dd>
        </div>
        <div>
          <dt>Returns</dt>
          <dd data-testid="return-count">{returns}</dd>
        </div>
        <div>
          <dt>Period</dt>
          <dd data-testid="period">{fit ? seconds(fit.period) : '—'}</dd>
        </div>
        <div>
          <dt>Spread</dt>
          <dd data-testid="spread">{fit && fit.spread !== null ? `± ${seconds(fit.spread)}` : '—'}</dd>
        </div>
      </dl>
      {problem !== undefined && (
        <p class="tap-timer__problem" role="alert">
          {problem}
        </p>
      )}
      {fit === undefined && problem === undefined && (
        <p class="tap-timer__note">
          {taps.length === 0
            ? 'Nothing tapped yet.'
            : 'Keep tapping: the period shows after the first return.'}
        </p>
      )}
      {fit !== undefined && returns < needed && (
        <p class="tap-timer__note">Tap at least {needed} returns to use the timing.</p>
      )}

      <div class="tap-timer__actions">
        <button
          type="button"
          class="tap-timer__secondary"
          disabled={stamps.length === 0}
          onClick={() => setStamps((previous) => previous.slice(0, -1))}
        >
          Undo last tap
        </button>
        <button
          type="button"
          class="tap-timer__secondary"
          disabled={stamps.length === 0}
          onClick={() => setStamps([])}
        >
          Start again
        </button>
        <button
          type="button"
          class="tap-timer__use"
          disabled={!ready}
          onClick={() => {
            if (fit && ready) onDone({ taps, returns: fit.returns, seconds: fit.period * fit.returns });
          }}
        >
          Use these taps
        </button>
      </div>
    </section>
  );
}
