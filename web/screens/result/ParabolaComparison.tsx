// The textbook parabola's figures beside the exact ones, labelled as a comparison only.
import type { Measurement, SpanGeometry, SpanSolution } from '../../../core/types';
import type { UnitSystem } from '../../../core/units';
import { show } from '../../app/format';
import { parabolaFigures } from './parabola-figures';

interface Props {
  geometry: SpanGeometry;
  weight: number;
  solution: SpanSolution;
  measurement: Measurement;
  units: UnitSystem;
}

function Difference({ parabola, exact }: { parabola: number; exact: number }) {
  if (!(exact !== 0) || !Number.isFinite(parabola)) return null;
  const percent = (100 * (parabola - exact)) / exact;
  return (
    <span class="muted small">
      {' '}
      ({percent >= 0 ? '+' : '−'}
      {Math.abs(percent).toFixed(1)} %)
    </span>
  );
}

export function ParabolaComparison({ geometry, weight, solution, measurement, units }: Props) {
  const figures = parabolaFigures(geometry, weight, solution.horizontalTension, measurement);
  const fromReading = figures.fromReading;
  return (
    <section class="panel comparison" aria-labelledby="comparison-title">
      <h2 id="comparison-title">Comparison: parabola approximation</h2>
      <p class="muted small">
        For comparison with hand calculations only. Every result above is from the exact catenary.
      </p>
      <table class="comparison__table">
        <thead>
          <tr>
            <th scope="col" />
            <th scope="col">Exact catenary</th>
            <th scope="col">Parabola</th>
          </tr>
        </thead>
        <tbody>
          {fromReading && (
            <>
              <tr>
                <th scope="row">
                  Tension from the reading <span class="muted small">({fromReading.rule})</span>
                </th>
                <td>{show(solution.horizontalTension, 'tension', units)}</td>
                <td>
                  {show(fromReading.horizontalTension, 'tension', units)}
                  <Difference parabola={fromReading.horizontalTension} exact={solution.horizontalTension} />
                </td>
              </tr>
              <tr>
                <th scope="row">Midspan sag from the reading</th>
                <td>{show(solution.midspanSag, 'sag', units)}</td>
                <td>
                  {show(fromReading.sag, 'sag', units)}
                  <Difference parabola={fromReading.sag} exact={solution.midspanSag} />
                </td>
              </tr>
            </>
          )}
          <tr>
            <th scope="row">Midspan sag at the solved tension</th>
            <td>{show(solution.midspanSag, 'sag', units)}</td>
            <td>
              {show(figures.sagAtSolvedTension, 'sag', units)}
              <Difference parabola={figures.sagAtSolvedTension} exact={solution.midspanSag} />
            </td>
          </tr>
        </tbody>
      </table>
    </section>
  );
}
