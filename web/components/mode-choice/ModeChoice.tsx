// A row of big radio tiles for choosing one of a few ways to give figures (library or own figures, elevations or
// heights above ground, initial or final state). Styles: .mode-choice in the app stylesheet.

export interface ModeOption<T extends string | number> {
  value: T;
  label: string;
  /** A short second line under the label. */
  hint?: string;
}

export function ModeChoice<T extends string | number>({
  legend,
  name,
  options,
  value,
  onChange,
}: {
  legend: string;
  name: string;
  options: readonly ModeOption<T>[];
  value: T;
  onChange: (value: T) => void;
}) {
  return (
    <fieldset class="mode-choice">
      <legend class="field__label">{legend}</legend>
      {options.map((option) => (
        <label
          key={String(option.value)}
          class={`mode-choice__tile${option.value === value ? ' is-chosen' : ''}`}
        >
          <input
            type="radio"
            name={name}
            checked={option.value === value}
            onChange={() => onChange(option.value)}
          />
          {option.hint === undefined ? (
            option.label
          ) : (
            <span class="mode-choice__with-hint">
              {option.label}
              <span class="mode-choice__hint">{option.hint}</span>
            </span>
          )}
        </label>
      ))}
    </fieldset>
  );
}
