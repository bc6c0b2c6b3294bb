/**
 * Design condition (b): a table of ruling-span midspan sag against conductor temperature, turned into the
 * horizontal tension the section should carry at any temperature.
 */
import { spanAtTension } from '../catenary';
import { SpanInputError } from '../errors';
import { expandBracket, findRoot } from '../roots';
import type { SpanGeometry } from '../types';
import { changeWireState } from './state-model';
import type { AssessConductor, TableDesignInput, WireState } from './types';

/**
 * Horizontal tension whose exact catenary on the given span has the given midspan sag, N.
 * @param g span > 0 m and rise m (the level ruling span for a design table)
 * @param weight load per length > 0, N/m
 * @param sag midspan sag > 0, m
 * Method: midspan sag falls monotonically with H; bracket grown from the parabola guess w·S²/(8·sag) and checked
 * for a sign change, then Brent (core/roots) to 1e-13 on H.
 */
export function tensionForMidspanSag(g: SpanGeometry, weight: number, sag: number): number {
  if (!Number.isFinite(sag) || sag <= 0) {
    throw new SpanInputError('sag-not-positive', 'Design table sags must be numbers greater than zero.');
  }
  const guess = (weight * g.span * g.span) / (8 * sag);
  const residual = (h: number): number => spanAtTension(g, weight, h).midspanSag - sag;
  const [lo, hi] = expandBracket(residual, guess / 2, guess * 2);
  return findRoot(residual, lo, hi).root;
}

/** Rows sorted by temperature, checked: at least two, finite, distinct temperatures, positive sags. */
export function sortedTableRows(table: TableDesignInput): { temperature: number; sag: number }[] {
  const rows = [...table.rows].sort((a, b) => a.temperature - b.temperature);
  const valid =
    rows.length >= 2 &&
    rows.every((row) => Number.isFinite(row.temperature) && Number.isFinite(row.sag) && row.sag > 0) &&
    rows.every((row, i) => i === 0 || row.temperature > (rows[i - 1]?.temperature ?? -Infinity));
  if (!valid) {
    throw new SpanInputError(
      'design-table-invalid',
      'A design table needs at least two rows with different temperatures and sags greater than zero.',
    );
  }
  return rows;
}

/** Design tension from a table at one temperature, and whether the table had to be extrapolated. */
export interface TableTension {
  horizontalTension: number;
  /** Midspan sag of the table's span at that tension, m. */
  sag: number;
  extrapolated: boolean;
}

/**
 * Design horizontal tension at a conductor temperature from a sag table for the ruling span, N.
 * @param table rows of (temperature °C, midspan sag m) for the ruling span, in the table's state
 * @param g the span the table describes (the level ruling span), m
 * @param conductor the section's conductor (weight N/m and elastic data for extrapolation)
 * @param temperature wanted conductor temperature, °C
 * @param state wanted condition; when it differs from the table's, the temperature is shifted by the creep offset
 *   (a final wire at t hangs as the initial wire at t + offset)
 * @param creepOffset creep allowance, °C
 * Method: inside the table, linear interpolation of sag in temperature (sag is close to linear in temperature
 * between rows a few degrees apart), then the exact catenary H for that sag (tensionForMidspanSag). Outside the
 * table the nearest row's tension is carried to the wanted temperature by the exact change of state (never
 * clamped: clamping would understate the hot-day sag), and the result is flagged as extrapolated.
 */
export function tableTensionAt(
  table: TableDesignInput,
  g: SpanGeometry,
  conductor: AssessConductor,
  temperature: number,
  state: WireState,
  creepOffset: number,
): TableTension {
  const rows = sortedTableRows(table);
  const tableState = table.state ?? 'final';
  // Temperature at which the table, in its own state, shows the wire we want.
  const shift = (state === 'final' ? creepOffset : 0) - (tableState === 'final' ? creepOffset : 0);
  const lookup = temperature + shift;
  const first = rows[0];
  const last = rows[rows.length - 1];
  if (first === undefined || last === undefined) throw new Error('unreachable: rows checked above');
  if (lookup < first.temperature || lookup > last.temperature) {
    const end = lookup < first.temperature ? first : last;
    const endTension = tensionForMidspanSag(g, conductor.weight, end.sag);
    const horizontalTension = changeWireState(
      g,
      conductor,
      { horizontalTension: endTension, temperature: end.temperature, state: tableState },
      { temperature: lookup, state: tableState },
      creepOffset,
    );
    return {
      horizontalTension,
      sag: spanAtTension(g, conductor.weight, horizontalTension).midspanSag,
      extrapolated: true,
    };
  }
  let sag = last.sag;
  for (let i = 1; i < rows.length; i++) {
    const lo = rows[i - 1];
    const hi = rows[i];
    if (lo === undefined || hi === undefined || lookup > hi.temperature) continue;
    const fraction = (lookup - lo.temperature) / (hi.temperature - lo.temperature);
    sag = lo.sag + fraction * (hi.sag - lo.sag);
    break;
  }
  return { horizontalTension: tensionForMidspanSag(g, conductor.weight, sag), sag, extrapolated: false };
}
