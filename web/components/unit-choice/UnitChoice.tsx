// Metric or US customary, as two big radio tiles.
import type { UnitSystem } from '../../../core/units';
import './unit-choice.css';

const CHOICES: { value: UnitSystem; title: string; detail: string }[] = [
  { value: 'metric', title: 'Metric', detail: 'm, kN, kg/m, °C' },
  { value: 'us', title: 'US customary', detail: 'ft, lbf, lb/ft, °F' },
];

export function UnitChoice({
  value,
  onChange,
}: {
  value: UnitSystem;
  onChange: (value: UnitSystem) => void;
}) {
  return (
    <fieldset class="unit-choice">
      <legend class="field__label">Units</legend>
      {CHOICES.map((choice) => (
        <label key={choice.value} class={`unit-choice__tile${value === choice.value ? ' is-chosen' : ''}`}>
          <input
            type="radio"
            name="unit-system"
            value={choice.value}
            checked={value === choice.value}
            onChange={() => onChange(choice.value)}
          />
          <span>
            <strong>{choice.title}</strong>
            <span class="unit-choice__detail">{choice.detail}</span>
          </span>
        </label>
      ))}
    </fieldset>
  );
}
