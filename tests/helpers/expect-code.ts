// Asserts that a call fails with one specific SpanInputError code (never just "it threw").
import { expect } from 'vitest';
import { SpanInputError, type SpanInputErrorCode } from '../../core/errors';

export function expectCode(call: () => unknown, code: SpanInputErrorCode): void {
  let caught: unknown = undefined;
  try {
    call();
  } catch (error) {
    caught = error;
  }
  expect(caught, `expected SpanInputError '${code}', but nothing was thrown`).toBeInstanceOf(SpanInputError);
  expect((caught as SpanInputError).code).toBe(code);
}
