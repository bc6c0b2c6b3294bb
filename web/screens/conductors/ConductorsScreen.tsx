// The conductor library with its sources. Conductors of your own are entered on a tension section ("My own
// figures"), where they are stored with the section.
import { useState } from 'preact/hooks';
import { CONDUCTOR_LIBRARY, libraryLabel } from '../../../core/conductors';
import type { UnitSystem } from '../../../core/units';
import { show } from '../../app/format';
import { href } from '../../app/router';
import { Crumbs } from '../../components/crumbs/Crumbs';
import { UnitChoice } from '../../components/unit-choice/UnitChoice';
import './conductors.css';

export function ConductorsScreen() {
  const [units, setUnits] = useState<UnitSystem>('metric');
  return (
    <section>
      <Crumbs items={[{ label: 'Lines', to: href() }]} />
      <h1>Conductor library</h1>
      <p>
        Bare ACSR conductors with their published figures. Choose one on a tension section, or enter your own
        figures there (weight, diameter, area, modulus, expansion and rated strength).
      </p>
      <UnitChoice value={units} onChange={setUnits} />
      <ul class="list conductor-list">
        {CONDUCTOR_LIBRARY.map((conductor) => (
          <li key={conductor.id} class="conductor-card">
            <h2>{libraryLabel(conductor)}</h2>
            <dl class="conductor-card__figures">
              <div>
                <dt>Weight</dt>
                <dd>{show(conductor.weight, 'weightPerLength', units)}</dd>
              </div>
              <div>
                <dt>Diameter</dt>
                <dd>{show(conductor.diameter, 'diameter', units)}</dd>
              </div>
              <div>
                <dt>Area</dt>
                <dd>{show(conductor.area, 'area', units)}</dd>
              </div>
              <div>
                <dt>Rated strength</dt>
                <dd>{show(conductor.ratedStrength, 'tension', units)}</dd>
              </div>
              <div>
                <dt>Modulus (final)</dt>
                <dd>{show(conductor.modulus, 'modulus', units)}</dd>
              </div>
              <div>
                <dt>Expansion</dt>
                <dd>{show(conductor.expansion, 'expansion', units)}</dd>
              </div>
            </dl>
            <p class="muted small">Source: {conductor.source}</p>
          </li>
        ))}
      </ul>
    </section>
  );
}
