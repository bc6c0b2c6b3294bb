// A number typed in the line's units: raw text in, raw text out (drafts keep exactly what was typed), a unit
// label beside the box, and the message of the caller's validation right under it.
import './field.css';

interface NumberFieldProps {
  /** Stable id: the draft key of this field, and the input's id. */
  id: string;
  label: string;
  /** Shown unit symbol, e.g. "m" or "ft". */
  unit?: string;
  /** Text as typed. */
  value: string;
  onInput: (text: string) => void;
  /** Validation message shown beside the field, or null when the text is fine. */
  error?: string | null;
  hint?: string;
  placeholder?: string;
  /** Integers only (e.g. a count): a numeric keypad without the separator. */
  integer?: boolean;
}

export function NumberField({
  id,
  label,
  unit,
  value,
  onInput,
  error,
  hint,
  placeholder,
  integer,
}: NumberFieldProps) {
  const messageId = `${id}-message`;
  const hintId = `${id}-hint`;
  const described = [hint ? hintId : '', error ? messageId : ''].filter(Boolean).join(' ') || undefined;
  return (
    <div class={`field${error ? ' field--invalid' : ''}`}>
      <label class="field__label" for={id}>
        {label}
      </label>
      {hint && (
        <span class="field__hint" id={hintId}>
          {hint}
        </span>
      )}
      <div class="field__box">
        <input
          class="field__input"
          id={id}
          name={id}
          type="text"
          inputMode={integer ? 'numeric' : 'decimal'}
          autoComplete="off"
          spellcheck={false}
          value={value}
          placeholder={placeholder}
          aria-invalid={error ? true : undefined}
          aria-describedby={described}
          onInput={(event) => onInput(event.currentTarget.value)}
        />
        {unit && <span class="field__unit">{unit}</span>}
      </div>
      {error && (
        <span class="field__message" id={messageId} role="alert">
          {error}
        </span>
      )}
    </div>
  );
}
