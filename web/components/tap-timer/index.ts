/**
 * Return-wave tap timer.
 *
 * `<TapTimer onDone={…} now?={…} minimumReturns?={2}>{caution}</TapTimer>`
 *
 * One very large button (full width, ≥ 200 px high, reacts on pointer-down, no double-tap zoom, also Space/Enter):
 * tap at the strike, then at every return felt. Shows taps, returns, the fitted period and its spread, with
 * "Undo last tap", "Start again" and "Use these taps".
 *
 * Props:
 * - `onDone(result: TapTimerResult)`: `{ taps: number[] /* s from the strike, strike = 0 first *\/;
 *   returns: number; seconds: number /* returns × fitted period *\/ }`. Only enabled once the fit succeeds and at
 *   least `minimumReturns` returns are tapped.
 * - `now?: () => number` clock in ms (default `performance.now()`); inject one in tests.
 * - `minimumReturns?: number` default 2.
 * - `children?`: a slot above the button for the screen's contact caution.
 *
 * The fit (least-squares period, its standard error) is core/return-wave-taps.ts `fitTapPeriod`.
 */
export { TapTimer, type TapTimerProps, type TapTimerResult } from './TapTimer';
