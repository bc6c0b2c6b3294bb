// A row of big radio tiles for choosing how a group of figures is given (library or own figures, elevations or
// heights above ground). Styles: .mode-choice in the app stylesheet.

export interface ModeOption<T extends string> {
  value: T;
  label: string;
}

export function ModeChoice<T extends string>({
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
        <label key={option.value} class={`mode-choice__tile${option.value === value ? ' is-chosen' : ''}`}>
          <input
            type="radio"
            name={name}
            checked={option.value === value}
            onChange={() => onChange(option.value)}
          />
          {option.label}
        </label>
      ))}
    </fieldset>
  );
}
