/**
 * Every way an input can fail to describe a solvable span. Codes are stable strings that the app maps to
 * field messages and that tests assert; the message is plain language for the person holding the phone.
 */
export type SpanInputErrorCode =
  | 'span-not-positive'
  | 'rise-not-finite'
  | 'weight-not-positive'
  | 'tension-not-positive'
  | 'sag-not-positive'
  | 'sag-too-large'
  | 'offset-outside-span'
  | 'drop-negative'
  | 'sight-line-misses-wire'
  | 'angle-not-finite'
  | 'angle-out-of-range'
  | 'returns-too-few'
  | 'time-not-positive'
  | 'taps-too-few'
  | 'taps-not-increasing'
  | 'points-too-few'
  | 'points-not-finite'
  | 'points-degenerate'
  | 'distance-not-positive'
  | 'fit-failed'
  | 'unknown-method'
  | 'spans-empty'
  | 'conductor-invalid'
  | 'state-invalid'
  | 'no-root'
  | 'input-not-finite'
  | 'design-table-invalid'
  | 'design-basis-invalid'
  | 'uncertainty-invalid'
  | 'tolerance-invalid';

/** Typed failure raised by every core function for input that admits no physical solution. */
export class SpanInputError extends Error {
  readonly code: SpanInputErrorCode;
  constructor(code: SpanInputErrorCode, message: string) {
    super(message);
    this.name = 'SpanInputError';
    this.code = code;
  }
}
