// @vitest-environment happy-dom
import { h, render } from 'preact';
import { act } from 'preact/test-utils';
import { afterEach, describe, expect, it } from 'vitest';
import type { InstrumentShot } from '../../../core/records/reading';
import {
  ShotList,
  type ShotListDraft,
  type ShotListProps,
  type ShotListValue,
} from '../../../web/components/shots';
import { expectClose } from '../../helpers/expect-close';

/** Four-figure trigonometric tables (cos 12° = 0.9781, …) are good to about 1e-4 relative. */
const TABLE_TOLERANCE = 1e-4;
/** International foot, exact (1959 agreement). */
const FOOT = 0.3048;
const DEGREE = Math.PI / 180;

let host: HTMLElement;
let values: ShotListValue[] = [];

function mount(props: Partial<ShotListProps> = {}): void {
  host = document.createElement('div');
  document.body.appendChild(host);
  values = [];
  void act(() => {
    render(
      h(ShotList, { unitSystem: 'metric', onChange: (v: ShotListValue) => values.push(v), ...props }),
      host,
    );
  });
}

afterEach(() => {
  render(null, host);
  host.remove();
});

/** Types into the field whose label reads `label` (the nth such field, for shot rows). */
function type(label: string, text: string, nth = 0): void {
  const labels = [...host.querySelectorAll('label')].filter((l) => l.textContent === label);
  const input = host.querySelector<HTMLInputElement>(
    `#${CSS.escape(labels[nth]?.getAttribute('for') ?? 'none')}`,
  );
  if (!input) throw new Error(`no field "${label}" #${nth}`);
  void act(() => {
    input.value = text;
    input.dispatchEvent(new Event('input', { bubbles: true }));
  });
}

function last(): ShotListValue {
  const value = values[values.length - 1];
  if (!value) throw new Error('onChange never called');
  return value;
}

function enterStation(x: string, offset: string, ground: string, height: string): void {
  type('Along the line', x);
  type('Off the line', offset);
  type('Ground level', ground);
  type('Instrument height', height);
}

describe('ShotList', () => {
  // Hand computation with four-figure tables: station 20 m along, 12.4 m to the right of the line (offset −12.4,
  // left positive), ground 9.5 m below the near attachment, instrument 1.55 m; shot 30 m at 12° up, turned 25°
  // left of the line direction.
  //   x = 20 + 30·cos 12°·cos 25° = 20 + 30·0.97815·0.90631 = 46.595 m
  //   z = −9.5 + 1.55 + 30·sin 12° = −7.95 + 30·0.20791 = −1.7127 m
  //   off the line: −12.4 + 30·0.97815·sin 25° = −12.4 + 30·0.97815·0.42262 = 0.002 m (on the wire's plane)
  it('converts a hand-computed shot to a wire point and shows it', () => {
    mount();
    enterStation('20', '-12.4', '-9.5', '1.55');
    type('Slope distance', '30');
    type('Vertical angle', '12');
    type('Angle off line', '25');
    const value = last();
    expect(value.points).toHaveLength(1);
    expectClose(value.points[0]?.x ?? Number.NaN, 46.595, TABLE_TOLERANCE, 'x');
    expectClose(value.points[0]?.z ?? Number.NaN, -1.7127, TABLE_TOLERANCE, 'z');
    expect(value.shots[0]).toEqual({
      stationX: 20,
      stationOffset: -12.4,
      stationElevation: -9.5,
      instrumentHeight: 1.55,
      slopeDistance: 30,
      verticalAngle: 12 * DEGREE,
      horizontalAngle: 25 * DEGREE,
    });
    expect(host.querySelector('[data-testid="shot-point"]')?.textContent).toBe(
      '→ point at 46.60 m along, −1.71 m vs near attachment',
    );
    expect(host.querySelector('.shot-list__warning')).toBeNull();
    // Turned the wrong way (25° right): 24.8 m off the wire's plane, which the list points out.
    type('Angle off line', '-25');
    expect(host.querySelector('.shot-list__warning')?.textContent).toContain('24.80 m off the line');
  });

  it('takes feet on a US line and reports SI', () => {
    mount({ unitSystem: 'us' });
    // The same geometry in feet: 65.6 ft, 0 ft, −31.2 ft, 5.1 ft; shot 98.4 ft, 12°, 25°.
    enterStation('65.6', '0', '-31.2', '5.1');
    type('Slope distance', '98.4');
    type('Vertical angle', '12');
    type('Angle off line', '25');
    const value = last();
    expectClose(value.shots[0]?.slopeDistance ?? Number.NaN, 98.4 * FOOT, 1e-12, 'slope distance in m');
    // x = (65.6 + 98.4·0.97815·0.90631) ft = 152.83 ft = 46.583 m (hand computation, tables as above).
    expectClose(value.points[0]?.x ?? Number.NaN, 152.83 * FOOT, TABLE_TOLERANCE, 'x');
    expect(host.querySelector('[data-testid="shot-point"]')?.textContent).toContain('152.83 ft along');
  });

  it('reads the locale decimal comma and says why a bad field is refused, never NaN', () => {
    mount({ locale: 'de-DE' });
    enterStation('20', '15', '-9,5', '1,55');
    type('Slope distance', '30');
    type('Vertical angle', '12');
    type('Angle off line', '25');
    expectClose(last().shots[0]?.stationElevation ?? Number.NaN, -9.5, 1e-12, 'decimal comma');
    type('Slope distance', '3o');
    expect(host.querySelector('.shot-list__message')?.textContent).toBe('"3o" is not a number.');
    expect(last().points).toHaveLength(0);
    type('Slope distance', '-30');
    expect(host.querySelector('.shot-list__message')?.textContent).toBe(
      'The slope distance must be greater than zero.',
    );
    type('Slope distance', '30');
    type('Vertical angle', '95');
    expect(host.querySelector('.shot-list__message')?.textContent).toBe(
      'A vertical angle lies between −90° and 90°.',
    );
    expect(host.innerHTML).not.toContain('NaN');
    expect(last().points).toHaveLength(0);
  });

  it('adds and removes shots, and reopens from SI shots', () => {
    const shot = (distance: number, vertical: number): InstrumentShot => ({
      stationX: 50,
      stationOffset: 0,
      stationElevation: -8,
      instrumentHeight: 1.5,
      slopeDistance: distance,
      verticalAngle: vertical * DEGREE,
      horizontalAngle: 0,
    });
    mount({ initialShots: [shot(20, 20), shot(30, 15), shot(40, 11)], span: 100 });
    expect(host.querySelectorAll('.shot-list__shot')).toHaveLength(3);
    expect(host.querySelector('[data-testid="point-count"]')?.textContent).toBe('3 points ready');
    void act(() => host.querySelector<HTMLButtonElement>('[aria-label="Remove shot 2"]')?.click());
    expect(last().points).toHaveLength(2);
    expectClose(last().shots[1]?.slopeDistance ?? Number.NaN, 40, 1e-12, 'third shot moved up');
    void act(() => host.querySelector<HTMLButtonElement>('.shot-list__add')?.click());
    expect(host.querySelectorAll('.shot-list__shot')).toHaveLength(3);
    expect(last().points).toHaveLength(2);
    // A shot running 70 m along from 50 m lands beyond the far support of a 100 m span.
    type('Slope distance', '70', 2);
    type('Vertical angle', '5', 2);
    type('Angle off line', '0', 2);
    expect(host.querySelector('.shot-list__warning')?.textContent).toContain('beyond the supports');
  });

  it('hands out the typed text as a draft and restores it exactly, half-typed rows included', () => {
    const drafts: ShotListDraft[] = [];
    mount({ onDraftChange: (d: ShotListDraft) => drafts.push(d) });
    enterStation('20', '0', '-9.5', '1.55');
    type('Slope distance', '3o');
    const draft = drafts[drafts.length - 1];
    if (!draft) throw new Error('onDraftChange never called');
    expect(draft.station).toEqual({ x: '20', offset: '0', elevation: '-9.5', height: '1.55' });
    expect(draft.rows[0]).toEqual({ distance: '3o', vertical: '', horizontal: '' });
    render(null, host);
    host.remove();
    mount({ initialDraft: draft });
    const inputs = [...host.querySelectorAll('input')].map((i) => i.value);
    expect(inputs.slice(0, 5)).toEqual(['20', '0', '-9.5', '1.55', '3o']);
    expect(host.querySelector('.shot-list__message')?.textContent).toBe('"3o" is not a number.');
  });
});
