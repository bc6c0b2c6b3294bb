// Six big choices, each saying what to measure and where.
import type { MethodId } from '../../../core/types';
import { METHODS } from './methods';

export function MethodPicker({ onPick }: { onPick: (method: MethodId) => void }) {
  return (
    <div class="method-picker">
      {METHODS.map((method) => (
        <button
          key={method.id}
          type="button"
          class="method-choice"
          data-method={method.id}
          onClick={() => onPick(method.id)}
        >
          <span class="method-choice__title">{method.title}</span>
          <span class="method-choice__what">{method.what}</span>
          {method.contact && <span class="method-choice__flag">Touches the wire</span>}
        </button>
      ))}
    </div>
  );
}
