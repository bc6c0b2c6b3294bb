import { useId, useRef, useState } from 'preact/hooks';
import { SpanInputError } from '../../../core/errors';
import { shotToSpanPoint, type ShotPoint } from '../../../core/instrument-shot';
import type { InstrumentShot } from '../../../core/records/reading';
import {
  formatQuantity,
  parseQuantity,
  unitLabel,
  type QuantityKind,
  type UnitSystem,
} from '../../../core/units';
import { formatLength } from '../profile/display-units';
import './ShotList.css';

/** What the list reports after every edit: the complete, valid shots (SI) and the wire points they give. */
export interface ShotListValue {
  /** One entry per complete, valid shot row, in SI (m, rad), station repeated in each. */
  shots: InstrumentShot[];
  /** Wire points from those shots, same order: x m from the near support, z m above the near attachment. */
  points: { x: number; z: number }[];
}

export interface ShotListProps {
  /** Units the line is kept in: lengths in m or ft; angles always in degrees. */
  unitSystem: UnitSystem;
  /** BCP 47 locale whose decimal separator is accepted besides "."; the browser's language when absent. */
  locale?: string;
  /** Shots to start from (a reopened draft or reading), SI; the station is taken from the first. */
  initialShots?: InstrumentShot[];
  /** Exactly what was typed last time (from onDraftChange); wins over initialShots, keeps half-typed rows. */
  initialDraft?: ShotListDraft;
  /** Span length, m: when given, points beyond the supports are pointed out. */
  span?: number;
  onChange: (value: ShotListValue) => void;
  /** Called with the raw typed text after every edit, for a draft that survives a reload. */
  onDraftChange?: (draft: ShotListDraft) => void;
}

interface StationText {
  x: string;
  offset: string;
  elevation: string;
  height: string;
}

interface RowText {
  key: number;
  distance: string;
  vertical: string;
  horizontal: string;
}

/** The list's fields as typed (line units, degrees), so a draft can restore them exactly. */
export interface ShotListDraft {
  station: StationText;
  rows: { distance: string; vertical: string; horizontal: string }[];
}

/** A typed field after reading: a value in SI, nothing yet, or the message to show beside it. */
type FieldState = { status: 'ok'; value: number } | { status: 'empty' } | { status: 'bad'; message: string };

interface FieldRule {
  kind: QuantityKind;
  /** Domain check on the SI value; returns a message when it fails. */
  check?: (valueSI: number) => string | undefined;
}

const DEGREE = Math.PI / 180;
/**
 * A shot landing farther than this from the span's vertical plane is pointed out, m. Our own judgement: more than
 * a wire sways in still air or a station is mislocated by, so most likely a wrong angle or the wrong wire.
 */
const OFF_LINE_WARNING = 1.5;

const RULES = {
  stationX: { kind: 'length' },
  stationOffset: { kind: 'length' },
  stationElevation: { kind: 'length' },
  instrumentHeight: {
    kind: 'length',
    check: (v) =>
      v < 0 ? 'The instrument height is measured up from the ground and cannot be negative.' : undefined,
  },
  slopeDistance: {
    kind: 'length',
    check: (v) => (v <= 0 ? 'The slope distance must be greater than zero.' : undefined),
  },
  verticalAngle: {
    kind: 'angle',
    check: (v) => (Math.abs(v) >= 90 * DEGREE ? 'A vertical angle lies between −90° and 90°.' : undefined),
  },
  horizontalAngle: {
    kind: 'angle',
    check: (v) =>
      Math.abs(v) > 180 * DEGREE ? 'A horizontal angle lies between −180° and 180°.' : undefined,
  },
} satisfies Record<string, FieldRule>;

function readField(text: string, rule: FieldRule, units: UnitSystem, locale: string | undefined): FieldState {
  if (text.trim() === '') return { status: 'empty' };
  const parsed = parseQuantity(text, rule.kind, units, locale);
  if (!parsed.ok) return { status: 'bad', message: parsed.message };
  const message = rule.check?.(parsed.value);
  return message === undefined ? { status: 'ok', value: parsed.value } : { status: 'bad', message };
}

/** SI value → text for a field, to six decimals with trailing zeros dropped (enough to round-trip what was typed). */
function toFieldText(
  valueSI: number,
  kind: QuantityKind,
  units: UnitSystem,
  locale: string | undefined,
): string {
  const shown = formatQuantity(valueSI, kind, units, {
    decimals: 6,
    ...(locale === undefined ? {} : { locale }),
  });
  return shown.value.replace(/([.,]\d*?)0+$/, '$1').replace(/[.,]$/, '');
}

interface DerivedRow {
  distance: FieldState;
  vertical: FieldState;
  horizontal: FieldState;
  shot?: InstrumentShot;
  point?: ShotPoint;
  /** Why the core conversion refused a complete row. */
  problem?: string;
}

interface Derived {
  station: { x: FieldState; offset: FieldState; elevation: FieldState; height: FieldState };
  rows: DerivedRow[];
  value: ShotListValue;
}

function derive(
  station: StationText,
  rows: RowText[],
  units: UnitSystem,
  locale: string | undefined,
): Derived {
  const read = (text: string, rule: FieldRule) => readField(text, rule, units, locale);
  const stationState = {
    x: read(station.x, RULES.stationX),
    offset: read(station.offset, RULES.stationOffset),
    elevation: read(station.elevation, RULES.stationElevation),
    height: read(station.height, RULES.instrumentHeight),
  };
  const { x, offset, elevation, height } = stationState;
  const derivedRows = rows.map((row): DerivedRow => {
    const distance = read(row.distance, RULES.slopeDistance);
    const vertical = read(row.vertical, RULES.verticalAngle);
    const horizontal = read(row.horizontal, RULES.horizontalAngle);
    if (
      x.status !== 'ok' ||
      offset.status !== 'ok' ||
      elevation.status !== 'ok' ||
      height.status !== 'ok' ||
      distance.status !== 'ok' ||
      vertical.status !== 'ok' ||
      horizontal.status !== 'ok'
    ) {
      return { distance, vertical, horizontal };
    }
    const shot: InstrumentShot = {
      stationX: x.value,
      stationOffset: offset.value,
      stationElevation: elevation.value,
      instrumentHeight: height.value,
      slopeDistance: distance.value,
      verticalAngle: vertical.value,
      horizontalAngle: horizontal.value,
    };
    try {
      return { distance, vertical, horizontal, shot, point: shotToSpanPoint(shot) };
    } catch (error) {
      if (!(error instanceof SpanInputError)) throw error;
      return { distance, vertical, horizontal, problem: error.message };
    }
  });
  const shots: InstrumentShot[] = [];
  const points: { x: number; z: number }[] = [];
  for (const row of derivedRows) {
    if (row.shot && row.point) {
      shots.push(row.shot);
      points.push({ x: row.point.x, z: row.point.z });
    }
  }
  return { station: stationState, rows: derivedRows, value: { shots, points } };
}

interface ShotFieldProps {
  id: string;
  label: string;
  unit: string;
  text: string;
  state: FieldState;
  onInput: (text: string) => void;
}

function ShotField({ id, label, unit, text, state, onInput }: ShotFieldProps) {
  const bad = state.status === 'bad';
  return (
    <div class={`shot-list__field${bad ? ' shot-list__field--bad' : ''}`}>
      <label for={id}>{label}</label>
      <div class="shot-list__box">
        <input
          id={id}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          spellcheck={false}
          value={text}
          aria-invalid={bad ? true : undefined}
          aria-describedby={bad ? `${id}-message` : undefined}
          onInput={(event) => onInput(event.currentTarget.value)}
        />
        <span class="shot-list__unit">{unit}</span>
      </div>
      {bad && (
        <span class="shot-list__message" id={`${id}-message`} role="alert">
          {state.message}
        </span>
      )}
    </div>
  );
}

/**
 * Instrument shots for the surveyed-points method: the station and instrument height once, then any number of
 * shots, each converted to a wire point as it is typed.
 */
export function ShotList(props: ShotListProps) {
  const { unitSystem, initialShots, initialDraft, span, onChange, onDraftChange } = props;
  const baseId = useId();
  const locale = props.locale ?? (typeof navigator === 'undefined' ? undefined : navigator.language);
  const nextKey = useRef(0);
  const newRow = (shot?: InstrumentShot): RowText => {
    nextKey.current += 1;
    const text = (value: number | undefined, kind: QuantityKind): string =>
      value === undefined ? '' : toFieldText(value, kind, unitSystem, locale);
    return {
      key: nextKey.current,
      distance: text(shot?.slopeDistance, 'length'),
      vertical: text(shot?.verticalAngle, 'angle'),
      horizontal: text(shot?.horizontalAngle, 'angle'),
    };
  };
  const [station, setStation] = useState<StationText>(() => {
    if (initialDraft) return { ...initialDraft.station };
    const first = initialShots?.[0];
    const text = (value: number | undefined): string =>
      value === undefined ? '' : toFieldText(value, 'length', unitSystem, locale);
    return {
      x: text(first?.stationX),
      offset: text(first?.stationOffset ?? 0),
      elevation: text(first?.stationElevation),
      height: text(first?.instrumentHeight),
    };
  });
  const [rows, setRows] = useState<RowText[]>(() => {
    if (initialDraft) {
      return initialDraft.rows.map((typed) => {
        nextKey.current += 1;
        return { key: nextKey.current, ...typed };
      });
    }
    return initialShots && initialShots.length > 0
      ? initialShots.map((s) => newRow(s))
      : [newRow(), newRow(), newRow()];
  });

  const commit = (nextStation: StationText, nextRows: RowText[]): void => {
    setStation(nextStation);
    setRows(nextRows);
    onChange(derive(nextStation, nextRows, unitSystem, locale).value);
    onDraftChange?.({
      station: nextStation,
      rows: nextRows.map(({ distance, vertical, horizontal }) => ({ distance, vertical, horizontal })),
    });
  };
  const derived = derive(station, rows, unitSystem, locale);
  const length = unitLabel('length', unitSystem);
  const angle = unitLabel('angle', unitSystem);
  const stationReady = Object.values(derived.station).every((f) => f.status === 'ok');

  return (
    <div class="shot-list">
      <fieldset class="shot-list__station">
        <legend>Instrument station</legend>
        <p class="shot-list__help">
          Where the instrument stands: distance along the line from the near support, distance sideways off
          the line, and the ground level there measured from the near attachment (below it is negative).
        </p>
        <div class="shot-list__grid">
          <ShotField
            id={`${baseId}-sx`}
            label="Along the line"
            unit={length}
            text={station.x}
            state={derived.station.x}
            onInput={(t) => commit({ ...station, x: t }, rows)}
          />
          <ShotField
            id={`${baseId}-so`}
            label="Off the line"
            unit={length}
            text={station.offset}
            state={derived.station.offset}
            onInput={(t) => commit({ ...station, offset: t }, rows)}
          />
          <ShotField
            id={`${baseId}-se`}
            label="Ground level"
            unit={length}
            text={station.elevation}
            state={derived.station.elevation}
            onInput={(t) => commit({ ...station, elevation: t }, rows)}
          />
          <ShotField
            id={`${baseId}-ih`}
            label="Instrument height"
            unit={length}
            text={station.height}
            state={derived.station.height}
            onInput={(t) => commit({ ...station, height: t }, rows)}
          />
        </div>
      </fieldset>

      <p class="shot-list__help">
        Vertical angle: up from level is positive. Angle off line: horizontal angle from the line looking
        toward the far support.
      </p>
      <ol class="shot-list__shots">
        {rows.map((row, index) => {
          const d = derived.rows[index];
          if (!d) return null;
          const update = (patch: Partial<RowText>): void =>
            commit(
              station,
              rows.map((r) => (r.key === row.key ? { ...r, ...patch } : r)),
            );
          const id = `${baseId}-shot${row.key}`;
          const outside = d.point !== undefined && span !== undefined && (d.point.x < 0 || d.point.x > span);
          return (
            <li key={row.key} class="shot-list__shot" data-shot={index + 1}>
              <div class="shot-list__shot-head">
                <h4>Shot {index + 1}</h4>
                <button
                  type="button"
                  class="shot-list__remove"
                  aria-label={`Remove shot ${index + 1}`}
                  onClick={() =>
                    commit(
                      station,
                      rows.filter((r) => r.key !== row.key),
                    )
                  }
                >
                  ✕ Remove
                </button>
              </div>
              <div class="shot-list__grid">
                <ShotField
                  id={`${id}-d`}
                  label="Slope distance"
                  unit={length}
                  text={row.distance}
                  state={d.distance}
                  onInput={(t) => update({ distance: t })}
                />
                <ShotField
                  id={`${id}-v`}
                  label="Vertical angle"
                  unit={angle}
                  text={row.vertical}
                  state={d.vertical}
                  onInput={(t) => update({ vertical: t })}
                />
                <ShotField
                  id={`${id}-h`}
                  label="Angle off line"
                  unit={angle}
                  text={row.horizontal}
                  state={d.horizontal}
                  onInput={(t) => update({ horizontal: t })}
                />
              </div>
              <p class="shot-list__point" data-testid="shot-point" aria-live="polite">
                {d.point
                  ? `→ point at ${formatLength(d.point.x, unitSystem)} along, ${formatLength(d.point.z, unitSystem)} vs near attachment`
                  : d.problem !== undefined
                    ? `⚠ ${d.problem}`
                    : !stationReady
                      ? 'Fill in the station first.'
                      : 'Enter the distance and both angles.'}
              </p>
              {outside && (
                <p class="shot-list__warning">⚠ This point lies beyond the supports: check the shot.</p>
              )}
              {d.point !== undefined && Math.abs(d.point.offset) > OFF_LINE_WARNING && (
                <p class="shot-list__warning">
                  ⚠ This point is {formatLength(Math.abs(d.point.offset), unitSystem)} off the line: check the
                  angle off line and the station.
                </p>
              )}
            </li>
          );
        })}
      </ol>
      <div class="shot-list__footer">
        <button type="button" class="shot-list__add" onClick={() => commit(station, [...rows, newRow()])}>
          + Add shot
        </button>
        <span class="shot-list__count" data-testid="point-count">
          {derived.value.points.length} point{derived.value.points.length === 1 ? '' : 's'} ready
          {derived.value.points.length < 3 ? ' (the fit needs at least 3)' : ''}
        </span>
      </div>
    </div>
  );
}
