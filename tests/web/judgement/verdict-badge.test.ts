// @vitest-environment happy-dom
import { h, render, type ComponentChild } from 'preact';
import { afterEach, describe, expect, it } from 'vitest';
import { bandOf } from '../../../core/assess/tolerance';
import type { VerdictResult } from '../../../core/assess/types';
import { VerdictBadge, VerdictReason } from '../../../web/components/verdict/VerdictBadge';
import { WireVerdict } from '../../../web/components/verdict/WireVerdict';
import type { ShownVerdict } from '../../../web/judgement/assess-line';
import { drakeLine, FOOT } from './line-fixture';

const VERDICTS: ShownVerdict[] = [
  'within',
  'too-slack',
  'too-tight',
  'recheck',
  'no-design',
  'no-reading',
  'cannot-solve',
];

let host: HTMLElement;

function mount(node: ComponentChild): HTMLElement {
  host = document.createElement('div');
  document.body.appendChild(host);
  render(node, host);
  return host;
}

afterEach(() => {
  render(null, host);
  host.remove();
});

describe('VerdictBadge', () => {
  it('gives every verdict its own words, its own icon shape and its own class (readable without colour)', () => {
    const seen = VERDICTS.map((verdict) => {
      const root = mount(h(VerdictBadge, { verdict }));
      const badge = root.querySelector('.verdict-badge');
      const result = {
        text: badge?.textContent ?? '',
        shape: root.querySelector('svg')?.getAttribute('data-shape') ?? '',
        verdict: badge?.getAttribute('data-verdict'),
      };
      render(null, host);
      host.remove();
      return result;
    });
    mount(h('div', null));
    expect(seen.map((s) => s.verdict)).toEqual(VERDICTS);
    expect(new Set(seen.map((s) => s.text)).size).toBe(VERDICTS.length);
    expect(new Set(seen.map((s) => s.shape)).size).toBe(VERDICTS.length);
    expect(seen.every((s) => s.shape !== '' && s.text !== '')).toBe(true);
    expect(seen[1]?.text).toBe('Too slack');
    expect(seen[2]?.text).toBe('Too tight');
    expect(seen[3]?.text).toBe('Measure again');
    expect(seen[1]?.shape).toBe('chevron-down');
    expect(seen[2]?.shape).toBe('chevron-up');
    expect(seen[3]?.shape).toBe('dashed-ring');
  });

  it('hides the icon from screen readers so the words are read once', () => {
    const root = mount(h(VerdictBadge, { verdict: 'within', size: 'large' }));
    expect(root.querySelector('svg')?.getAttribute('aria-hidden')).toBe('true');
    expect(root.querySelector('.verdict-badge--large')).not.toBeNull();
  });
});

describe('VerdictReason', () => {
  // A made-up verdict: deviation +0.40 m, σ 0.05 m, tolerance ±0.15 m (IEEE Std 524 via Douglass & Thrash).
  const slack: VerdictResult = {
    verdict: 'too-slack',
    reason: 'core reason in metres',
    sagDeviation: 0.4,
    band: bandOf(0.4, 0.05),
    allowance: 0.15,
    margin: -0.25,
  };

  it('states the deviation, design sag, tolerance and band in the line’s units', () => {
    const metric = mount(
      h(VerdictReason, { verdict: 'too-slack', result: slack, designSag: 3.25, units: 'metric' }),
    );
    const text = metric.textContent ?? '';
    expect(text).toContain('0.40 m lower than the design sag of 3.25 m');
    expect(text).toContain('±0.15 m');
    // 95 % band = 0.4 ± 1.96 × 0.05 = 0.30 to 0.50 m (normal coverage factor).
    expect(text).toContain('95 % band +0.30 to +0.50 m');
    render(null, host);
    host.remove();
    const us = mount(h(VerdictReason, { verdict: 'too-slack', result: slack, designSag: 3.25, units: 'us' }));
    // 0.40 m = 1.31 ft, 3.25 m = 10.66 ft, 0.15 m = 0.49 ft (exact foot, NIST SP 811).
    expect(us.textContent).toContain('1.31 ft lower than the design sag of 10.66 ft');
    expect(us.textContent).toContain('±0.49 ft');
    expect(us.textContent).not.toContain('NaN');
  });

  it('explains a missing design without numbers', () => {
    const root = mount(h(VerdictReason, { verdict: 'no-design', units: 'metric' }));
    expect(root.textContent).toContain('design basis');
  });
});

describe('WireVerdict', () => {
  it('shows the judged verdict of a wire from the loaded records, and "not read yet" for a wire without readings', () => {
    const f = drakeLine();
    // Handbook Table 14.5 design sag 10.65 ft (Douglass & Thrash), read 0.5 m lower.
    f.addReading(f.wireA, { method: 'midspan-sag', sag: 10.65 * FOOT + 0.5 });
    const set = {
      line: [f.records.line],
      section: f.records.sections,
      structure: [],
      span: f.records.spans,
      wire: f.records.wires,
      reading: f.records.readings,
    };
    const root = mount(
      h(
        'div',
        null,
        h(WireVerdict, { records: set, wireId: f.wireA.id, withReason: true }),
        h(WireVerdict, { records: set, wireId: f.wireB.id }),
      ),
    );
    const verdicts = [...root.querySelectorAll('.verdict-badge')].map((b) => b.getAttribute('data-verdict'));
    expect(verdicts).toEqual(['too-slack', 'no-reading']);
    expect(root.querySelector('[data-testid="verdict-reason"]')?.textContent).toContain('too slack');
  });
});
