// @vitest-environment happy-dom
import { h, render, type ComponentChild } from 'preact';
import { afterEach, describe, expect, it } from 'vitest';
import type { SpanRecord } from '../../../core/records/span';
import { CheckList } from '../../../web/components/checks/CheckList';
import { judgeLine } from '../../../web/judgement/assess-line';
import { SectionSummary } from '../../../web/screens/section-summary/SectionSummary';
import { drakeLine, FOOT, testId } from './line-fixture';

/** Douglass & Thrash, Electric Power Engineering Handbook, Table 14.5: Drake, 700 ft, 6300 lb at 60 °F → 10.65 ft. */
const HANDBOOK_SAG = 10.65 * FOOT;

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

describe('CheckList', () => {
  it('shows design and measured side by side, the band against the tolerance and every check with a status', () => {
    const f = drakeLine(undefined, 'us');
    const reading = f.addReading(f.wireA, { method: 'midspan-sag', sag: HANDBOOK_SAG + 0.5 });
    const result = judgeLine(f.records).readings.get(reading.id)?.result;
    if (!result?.ok) throw new Error('not judged');
    const root = mount(h(CheckList, { assessment: result.value, units: 'us' }));
    const rows = [...root.querySelectorAll('.versus__table tbody tr')].map((row) =>
      [...row.children].map((cell) => cell.textContent),
    );
    expect(rows.map((row) => row[0])).toEqual(['Horizontal tension H', 'Midspan sag', 'Maximum sag']);
    // Design H at its own condition is the handbook's 6300 lb; design sag 10.64 ft (table prints 10.65).
    expect(rows[0]?.[1]).toBe('6300 lbf');
    expect(rows[1]?.[1]).toMatch(/^10\.6[45] ft$/);
    // Measured − design sag: 0.503 m = +1.65 ft.
    expect(rows[1]?.[3]).toBe('+1.65 ft');
    const statuses = [...root.querySelectorAll('.check-row .status-mark')].map((m) =>
      m.getAttribute('data-status'),
    );
    // measured-state row, three NESC limits, vibration, clearance.
    expect(statuses).toHaveLength(6);
    expect(statuses).toContain('not-checked');
    expect(root.textContent).toContain('from memory');
    expect(root.textContent).toContain('local code');
    expect(root.querySelector('.uncertainty-bar__band')).not.toBeNull();
    expect(root.querySelectorAll('.uncertainty-bar__limit')).toHaveLength(2);
    expect(root.textContent).not.toContain('NaN');
  });
});

describe('SectionSummary', () => {
  it('counts verdicts, lists the worst wire first with its reason, and points out a span that stands out', () => {
    const f = drakeLine(undefined, 'metric');
    // Four more spans of the same section and length, each with a wire A read at the design sag, and wire A of
    // the first span read 0.5 m slacker: that span's tension stands out (modified z-score above 3.5 with five
    // spans; Iglewicz & Hoaglin, from memory).
    const names = new Map<string, string>([[f.span.id, 'Span 1 → 2']]);
    for (let index = 2; index <= 5; index += 1) {
      const span: SpanRecord = { ...f.span, id: testId() };
      names.set(span.id, `Span ${index} → ${index + 1}`);
      const wire = { ...f.wireA, id: testId(), spanId: span.id };
      f.records.spans.push(span);
      f.records.wires.push(wire);
      const reading = f.addReading(wire, { method: 'midspan-sag', sag: HANDBOOK_SAG });
      reading.spanId = span.id;
      reading.uncertainty = { sag: 0.01, temperature: 0.5 };
    }
    f.addReading(f.wireA, { method: 'midspan-sag', sag: HANDBOOK_SAG + 0.5 });
    const section = judgeLine(f.records).sections[0];
    if (!section) throw new Error('no section');
    const root = mount(
      h(SectionSummary, {
        judgement: section,
        unitSystem: 'metric',
        spanName: (span: SpanRecord) => names.get(span.id) ?? '?',
      }),
    );
    const counts: Record<string, string> = {};
    for (const item of root.querySelectorAll('.summary-counts__item')) {
      counts[item.getAttribute('data-verdict') ?? '?'] =
        item.querySelector('.summary-counts__number')?.textContent ?? '';
    }
    expect(counts).toEqual({ 'too-slack': '1', within: '4', 'no-reading': '1' });
    const first = root.querySelector('.summary-wires li');
    expect(first?.getAttribute('data-wire')).toBe(f.wireA.id);
    expect(first?.textContent).toContain('Too slack');
    expect(first?.textContent).toContain('Span 1 → 2');
    expect(root.querySelector(`[data-outlier="${f.wireA.id}"]`)?.textContent).toContain('Span 1 → 2');
  });

  it('asks for the design when the section has none', () => {
    const f = drakeLine(null);
    const section = judgeLine(f.records).sections[0]!;
    const root = mount(
      h(SectionSummary, { judgement: section, unitSystem: 'metric', spanName: () => 'Span' }),
    );
    expect(root.querySelector('[data-verdict="no-design"]')).not.toBeNull();
  });
});
