// @vitest-environment happy-dom
import { h, render } from 'preact';
import { afterEach, describe, expect, it } from 'vitest';
import { SpanProfile, type SpanProfileProps } from '../../../web/components/profile';
import { expectClose } from '../../helpers/expect-close';

/** Absolute tolerance for drawing coordinates, SVG user units (a twentieth of a pixel at true size). */
const DRAWING_TOLERANCE = 0.05;

let host: HTMLElement;

function draw(props: SpanProfileProps): HTMLElement {
  host = document.createElement('div');
  document.body.appendChild(host);
  render(h(SpanProfile, { layoutWidth: 720, ...props }), host);
  return host;
}

afterEach(() => {
  render(null, host);
  host.remove();
});

function pathPoints(d: string): { x: number; y: number }[] {
  return [...d.matchAll(/[ML](-?[\d.]+) (-?[\d.]+)/g)].map((m) => ({ x: Number(m[1]), y: Number(m[2]) }));
}

function attachmentCentres(root: HTMLElement): { x: number; y: number }[] {
  return [...root.querySelectorAll('.span-profile__attachment')].map((c) => ({
    x: Number(c.getAttribute('cx')),
    y: Number(c.getAttribute('cy')),
  }));
}

function sagLabelMetres(root: HTMLElement, metresPerUnit: number): number {
  const text = root.querySelector('.span-profile__sag-label')?.textContent ?? '';
  const match = /sag (\d+\.\d+) (m|ft)/.exec(text);
  expect(match, `sag label "${text}"`).not.toBeNull();
  return Number(match?.[1]) * metresPerUnit;
}

describe('SpanProfile', () => {
  // Gupta, Elements of Power System (2011), ch. 10 ex. E2: level span 260 m, 0.68 kg/m, working tension
  // 3100 kg / 2 = 1550 kg, sag 3.707 m. C = H/w = 1550/0.68 m (the kilogram-force cancels).
  const gupta = { span: 260, rise: 0, catenaryParameter: 1550 / 0.68 };

  it('labels the midspan sag of a textbook level span (Gupta ex. E2, 3.707 m) in metres and in feet', () => {
    const curves = [
      { label: 'measured', catenaryParameter: gupta.catenaryParameter, style: 'measured' as const },
    ];
    const metric = draw({ span: gupta.span, rise: gupta.rise, curves, unitSystem: 'metric' });
    // Label rounds to 0.01 m; 2e-3 relative covers that rounding and the book's parabola.
    expectClose(sagLabelMetres(metric, 1), 3.707, 2e-3, 'metric label');
    // Same sag from the level-span closed form D = C·(cosh(S/2C) − 1) (catenary, any textbook).
    const closedForm = gupta.catenaryParameter * (Math.cosh(gupta.span / (2 * gupta.catenaryParameter)) - 1);
    expectClose(sagLabelMetres(metric, 1), closedForm, 2e-3, 'closed form');
    render(null, host);
    host.remove();

    // International foot = 0.3048 m exactly; label rounds to 0.01 ft.
    const us = draw({ span: gupta.span, rise: gupta.rise, curves, unitSystem: 'us' });
    expectClose(sagLabelMetres(us, 0.3048), 3.707, 2e-3, 'US label');
    expect(us.textContent).toContain('distance from near support (ft)');
  });

  it('draws the wire of an inclined span through both attachments and the sag dimension onto the wire', () => {
    // Gupta ex. E12: span 600 m, supports 15 m apart in height, 2.925 kg/m, tension 8000·2.2/5 = 3520 kg.
    const root = draw({
      span: 600,
      rise: 15,
      curves: [{ label: 'measured', catenaryParameter: 3520 / 2.925, style: 'measured' }],
      unitSystem: 'metric',
    });
    const wire = root.querySelector('.span-profile__wire--measured');
    const points = pathPoints(wire?.getAttribute('d') ?? '');
    const [near, far] = attachmentCentres(root);
    const first = points[0];
    const last = points[points.length - 1];
    expect(points.length).toBeGreaterThan(50);
    if (!near || !far || !first || !last) throw new Error('attachments or wire missing from the drawing');
    expect(Math.abs(first.x - near.x)).toBeLessThan(DRAWING_TOLERANCE);
    expect(Math.abs(first.y - near.y)).toBeLessThan(DRAWING_TOLERANCE);
    expect(Math.abs(last.x - far.x)).toBeLessThan(DRAWING_TOLERANCE);
    expect(Math.abs(last.y - far.y)).toBeLessThan(DRAWING_TOLERANCE);
    // The far attachment is higher, so it is drawn above (smaller y) the near one.
    expect(far.y).toBeLessThan(near.y);
    // The sag dimension ends on the wire: midspan is sample 48 of 96.
    const middle = points[Math.floor(points.length / 2)];
    const dimension = root.querySelector('.span-profile__sag line');
    if (!middle || !dimension) throw new Error('midspan sample or sag dimension missing');
    expect(Math.abs(Number(dimension.getAttribute('y2')) - middle.y)).toBeLessThan(DRAWING_TOLERANCE);
    expect(Math.abs(Number(dimension.getAttribute('x2')) - middle.x)).toBeLessThan(DRAWING_TOLERANCE);
  });

  it('states the vertical exaggeration and gives the drawing a title and a description', () => {
    const root = draw({
      span: gupta.span,
      rise: 0,
      curves: [{ label: 'measured', catenaryParameter: gupta.catenaryParameter, style: 'measured' }],
      unitSystem: 'metric',
    });
    const note = root.querySelector('.span-profile__scale-note')?.textContent ?? '';
    const factor = Number(/vertical scale ×(\d+)/.exec(note)?.[1]);
    // 3.7 m of sag on 260 m needs well over ×5 to be visible in a 720 × 418 box.
    expect(factor).toBeGreaterThanOrEqual(5);
    expect(root.querySelector('svg title')?.textContent).toBe('Span profile');
    expect(root.querySelector('svg desc')?.textContent).toContain('midspan sag 3.71 m');
    expect(root.querySelector('[data-low-point="inside"]')).not.toBeNull();
  });

  it('shows "low point beyond near support" for a steep river crossing (Wadhwa ex. 7.4)', () => {
    // Wadhwa, Electrical Power Systems, ex. 7.4: towers 30 m and 90 m above water, 300 m apart, 2000 kg on
    // 1.0 kg/m: the lowest point lies 250 m beyond the lower tower (parabola; the exact catenary gives ≈ 247 m).
    const root = draw({
      span: 300,
      rise: 60,
      curves: [{ label: 'measured', catenaryParameter: 2000, style: 'measured' }],
      unitSystem: 'metric',
    });
    const marker = root.querySelector('[data-low-point="beyond-near"]');
    expect(marker).not.toBeNull();
    expect(marker?.textContent).toContain('low point beyond near support');
    expect(root.querySelector('[data-low-point="inside"]')).toBeNull();
    const distance = Number(/([\d.]+) m before it/.exec(marker?.textContent ?? '')?.[1]);
    expectClose(distance, 250, 0.02, 'distance beyond the lower tower');
  });

  it('shows "low point beyond far support" when the far end is the lower one', () => {
    const root = draw({
      span: 300,
      rise: -60,
      curves: [{ label: 'measured', catenaryParameter: 2000, style: 'measured' }],
      unitSystem: 'metric',
    });
    expect(root.querySelector('[data-low-point="beyond-far"]')?.textContent).toContain(
      'low point beyond far support',
    );
  });

  it('draws every wire style with its own dash pattern and names each in the legend', () => {
    const root = draw({
      span: 120,
      rise: 3,
      curves: [
        { label: 'measured 18 °C', catenaryParameter: 900, style: 'measured' },
        { label: 'design 18 °C', catenaryParameter: 1000, style: 'design' },
        { label: 'hot day 75 °C', catenaryParameter: 700, style: 'hot' },
        { label: 'parabola', catenaryParameter: 900, style: 'parabola' },
      ],
      ground: [
        { x: -10, elevation: -12 },
        { x: 60, elevation: -13 },
        { x: 130, elevation: -9 },
      ],
      requiredClearance: 5.6,
      readings: [
        { kind: 'sag-reading', x: 60, sag: 2 },
        { kind: 'sight-line', nearDrop: 2, farDrop: 2.2 },
        { kind: 'point', x: 30, z: -1.2 },
      ],
      unitSystem: 'metric',
    });
    const dashes = ['measured', 'design', 'hot', 'parabola'].map(
      (style) => root.querySelector(`[data-style="${style}"]`)?.getAttribute('stroke-dasharray') ?? 'solid',
    );
    expect(new Set(dashes).size).toBe(4);
    const legend = root.querySelector('.span-profile__legend')?.textContent ?? '';
    for (const text of [
      'measured 18 °C',
      'design 18 °C',
      'hot day 75 °C',
      'parabola',
      'chord',
      'ground',
      'required clearance (5.60 m over ground)',
      'sight line',
      'surveyed point',
    ]) {
      expect(legend).toContain(text);
    }
    expect(root.querySelector('.span-profile__clearance')).not.toBeNull();
    expect(root.innerHTML).not.toContain('NaN');
  });

  it('shows a note instead of a drawing when the span is missing, and never prints NaN', () => {
    const root = draw({ span: Number.NaN, rise: 0, curves: [], unitSystem: 'metric' });
    expect(root.querySelector('svg')).toBeNull();
    expect(root.textContent).toContain('span length');
    render(null, host);
    host.remove();
    const zeroTension = draw({
      span: 100,
      rise: 0,
      curves: [{ label: 'measured', catenaryParameter: 0, style: 'measured' }],
      unitSystem: 'metric',
    });
    expect(zeroTension.querySelector('.span-profile__wire')).toBeNull();
    expect(zeroTension.innerHTML).not.toContain('NaN');
  });
});
