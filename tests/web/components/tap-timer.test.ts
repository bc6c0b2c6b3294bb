// @vitest-environment happy-dom
import { h, render } from 'preact';
import { act } from 'preact/test-utils';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { TapTimer, type TapTimerResult } from '../../../web/components/tap-timer';
import { expectClose } from '../../helpers/expect-close';

/** Relative tolerance for a least-squares period from exact tap times (rounding only). */
const FIT_TOLERANCE = 1e-9;

let host: HTMLElement;
let clockMs = 0;
let results: TapTimerResult[] = [];

beforeEach(() => {
  host = document.createElement('div');
  document.body.appendChild(host);
  clockMs = 0;
  results = [];
  void act(() => {
    render(
      h(
        TapTimer,
        { now: () => clockMs, onDone: (r: TapTimerResult) => results.push(r) },
        h('p', { class: 'caution' }, 'caution text'),
      ),
      host,
    );
  });
});

afterEach(() => {
  render(null, host);
  host.remove();
});

function button(label: string): HTMLButtonElement {
  const found = [...host.querySelectorAll('button')].find((b) => b.textContent?.includes(label));
  if (!found) throw new Error(`no button "${label}"`);
  return found;
}

function tapAt(seconds: number): void {
  clockMs = 1_000_000 + seconds * 1000;
  void act(() => {
    host
      .querySelector('.tap-timer__tap')
      ?.dispatchEvent(new PointerEvent('pointerdown', { bubbles: true, button: 0 }));
  });
}

function click(label: string): void {
  void act(() => button(label).click());
}

function shown(testId: string): string {
  return host.querySelector(`[data-testid="${testId}"]`)?.textContent ?? '';
}

describe('TapTimer', () => {
  // Constructed timing: a 2.48 s return (RUS Bulletin 1726C-115 eq. 1 puts that at 12.075·2.48² ≈ 74 in of sag)
  // with reaction errors (+40, −80, 0, +80, −40 ms) that sum to zero and are orthogonal to the return number, so
  // a least-squares line recovers the period exactly while the taps themselves are uneven.
  const period = 2.48;
  const reactionErrors = [0.04, -0.08, 0, 0.08, -0.04];

  it('fits the period of uneven taps and hands over taps relative to the strike', () => {
    expect(host.querySelector('.caution')?.textContent).toBe('caution text');
    reactionErrors.forEach((error, k) => tapAt(k * period + error));
    expect(shown('tap-count')).toBe('5');
    expect(shown('return-count')).toBe('4');
    expectClose(Number(shown('period').replace(' s', '')), period, 5e-4, 'shown period (3 decimals)');
    expect(shown('spread')).toMatch(/^± 0\.0\d\d s$/);
    expect(button('Use these taps').disabled).toBe(false);

    click('Use these taps');
    expect(results).toHaveLength(1);
    const result = results[0];
    if (!result) throw new Error('onDone not called');
    expect(result.returns).toBe(4);
    expectClose(result.seconds, 4 * period, FIT_TOLERANCE, 'fitted time for 4 returns');
    expect(result.taps).toHaveLength(5);
    expect(result.taps[0]).toBe(0);
    // Last tap: 4·2.48 − 0.04 − (first tap's +0.04) = 9.84 s after the strike.
    expectClose(result.taps[4] ?? Number.NaN, 4 * period - 0.04 - 0.04, FIT_TOLERANCE, 'last tap');
  });

  it('undo removes the last tap and the fit follows; start again clears everything', () => {
    [0, 2.5, 5.0, 7.6].forEach((t) => tapAt(t));
    // Three returns at 0, 2.5, 5.0, 7.6 s: least-squares slope = Σ(k − 1.5)(t − t̄)/Σ(k − 1.5)² = 12.65/5 = 2.53 s.
    expectClose(Number(shown('period').replace(' s', '')), 2.53, 5e-4, 'period before undo');
    click('Undo last tap');
    expect(shown('tap-count')).toBe('3');
    expect(shown('return-count')).toBe('2');
    expectClose(Number(shown('period').replace(' s', '')), 2.5, 5e-4, 'period after undo');
    click('Start again');
    expect(shown('tap-count')).toBe('0');
    expect(shown('period')).toBe('—');
    expect(button('Use these taps').disabled).toBe(true);
    expect(button('Undo last tap').disabled).toBe(true);
  });

  it('does not offer the taps with a single return and shows no NaN before any tap', () => {
    expect(host.innerHTML).not.toContain('NaN');
    tapAt(0);
    tapAt(2.4);
    expect(shown('return-count')).toBe('1');
    expect(button('Use these taps').disabled).toBe(true);
    expect(host.textContent).toContain('Tap at least 2 returns');
    click('Use these taps');
    expect(results).toHaveLength(0);
  });

  it('ignores presses of other mouse buttons and records Space on the tap button', () => {
    clockMs = 500;
    void act(() => {
      host
        .querySelector('.tap-timer__tap')
        ?.dispatchEvent(new PointerEvent('pointerdown', { bubbles: true, button: 2 }));
    });
    expect(shown('tap-count')).toBe('0');
    void act(() => {
      host
        .querySelector('.tap-timer__tap')
        ?.dispatchEvent(new KeyboardEvent('keydown', { bubbles: true, key: ' ' }));
    });
    expect(shown('tap-count')).toBe('1');
  });
});

describe('TapTimer kept across a reload', () => {
  it('reports every tap for the draft, shows restored taps, and starts a new series on the next tap', () => {
    const reported: number[][] = [];
    const restoredHost = document.createElement('div');
    document.body.appendChild(restoredHost);
    // A 2.5 s period, three returns, as a draft would hold it after a reload (constructed, not measured).
    void act(() => {
      render(
        h(TapTimer, {
          now: () => clockMs,
          onDone: () => undefined,
          initialTaps: [0, 2.5, 5, 7.5],
          onTapsChange: (taps: number[]) => reported.push(taps),
        }),
        restoredHost,
      );
    });
    const show = (id: string): string =>
      restoredHost.querySelector(`[data-testid="${id}"]`)?.textContent ?? '';
    expect(show('return-count')).toBe('3');
    expect(show('period')).toContain('2.500');
    clockMs = 5_000_000;
    void act(() => {
      restoredHost
        .querySelector('.tap-timer__tap')
        ?.dispatchEvent(new PointerEvent('pointerdown', { bubbles: true, button: 0 }));
    });
    expect(show('tap-count')).toBe('1');
    expect(reported.at(-1)).toEqual([0]);
    render(null, restoredHost);
    restoredHost.remove();
  });
});
