// Plain text and multi-line notes, same look as the number field.
import './field.css';

interface TextFieldProps {
  id: string;
  label: string;
  value: string;
  onInput: (text: string) => void;
  error?: string | null;
  hint?: string;
  multiline?: boolean;
  placeholder?: string;
  autoComplete?: string;
}

export function TextField({
  id,
  label,
  value,
  onInput,
  error,
  hint,
  multiline,
  placeholder,
  autoComplete,
}: TextFieldProps) {
  const messageId = `${id}-message`;
  return (
    <div class={`field${error ? ' field--invalid' : ''}`}>
      <label class="field__label" for={id}>
        {label}
      </label>
      {hint && <span class="field__hint">{hint}</span>}
      <div class="field__box">
        {multiline ? (
          <textarea
            class="field__textarea"
            id={id}
            name={id}
            value={value}
            placeholder={placeholder}
            onInput={(event) => onInput(event.currentTarget.value)}
          />
        ) : (
          <input
            class="field__input field__input--text"
            id={id}
            name={id}
            type="text"
            value={value}
            placeholder={placeholder}
            autoComplete={autoComplete ?? 'off'}
            aria-invalid={error ? true : undefined}
            aria-describedby={error ? messageId : undefined}
            onInput={(event) => onInput(event.currentTarget.value)}
          />
        )}
      </div>
      {error && (
        <span class="field__message" id={messageId} role="alert">
          {error}
        </span>
      )}
    </div>
  );
}
