// @vitest-environment happy-dom
// The browser side of the exports (web/exports), rendered in happy-dom (a DOM implementation from the npm
// registry): the printable report's content and escaping, the print action, the download helper and the sliced
// builder. Expectations come from the issue (summary, profile per span, checks, cautions, sign-off; notes escaped)
// and from the HTML standard's `download` attribute on <a>.
import { h, render } from 'preact';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { inspectionLogJob, writeBackupJson, type RecordSet } from '../../../core';
import { ExportPanel } from '../../../web/exports/ExportPanel';
import { PrintReport, REPORT_CAUTIONS } from '../../../web/exports/PrintReport';
import { collectInSlices, downloadBlob, exportFileName } from '../../../web/exports/download';
import { fixtureLine, fixtureLogInput, fixtureUuid } from './line-fixture';

const HOSTILE = '<script>window.hacked = true</script><img src=x onerror="window.hacked = true">';

afterEach(() => {
  document.body.innerHTML = '';
  vi.restoreAllMocks();
});

function renderReport(spans = 3): HTMLElement {
  const records = fixtureLine({ spans, notes: [HOSTILE, 'second note'] });
  const container = document.createElement('div');
  document.body.append(container);
  render(
    h(PrintReport, { lines: [fixtureLogInput(records)], preparedAt: '2026-05-15T09:30:00.000Z' }),
    container,
  );
  return container;
}

describe('printable report', () => {
  it('shows a summary, one profile drawing and checks table per span, the cautions and a sign-off block', () => {
    const container = renderReport(3);
    const text = container.textContent ?? '';
    expect(container.querySelector('h1')?.textContent).toBe('Sag inspection report: Łódź–Süd feeder 日本');
    expect(container.querySelectorAll('.print-report__span')).toHaveLength(3);
    expect(container.querySelectorAll('.print-report__span svg').length).toBeGreaterThanOrEqual(3);
    expect(container.querySelectorAll('.print-report__checks tbody tr')).toHaveLength(9);
    for (const caution of REPORT_CAUTIONS) expect(text).toContain(caution);
    expect(container.querySelector('.print-report__signoff')?.textContent).toMatch(
      /Inspector.*Name.*Date.*Signature/,
    );
    expect(text).toContain('Horizontal tension');
    expect(text).toMatch(/\d+\.\d{2} kN/);
  });

  it('prints notes as text: no element is made from them and the words survive', () => {
    const container = renderReport(2);
    expect(container.querySelector('.print-report script')).toBeNull();
    expect(container.querySelector('.print-report img')).toBeNull();
    const notes = [...container.querySelectorAll('.print-report__notes')].map((node) => node.textContent);
    expect(notes).toContain(HOSTILE);
    expect((window as unknown as { hacked?: boolean }).hacked).toBeUndefined();
  });

  it('"Print / save as PDF" opens the print dialog', () => {
    const print = vi.fn();
    // happy-dom has no print dialog; stand one in where the browser's would be.
    Object.assign(window, { print });
    const container = renderReport(1);
    const button = container.querySelector<HTMLButtonElement>('.print-report__print');
    expect(button?.textContent).toBe('Print / save as PDF');
    button?.click();
    expect(print).toHaveBeenCalledTimes(1);
  });
});

describe('download helpers', () => {
  it('downloadBlob clicks a temporary link with the file name and an object URL, then revokes it', async () => {
    const create = vi.fn(() => 'blob:test/1');
    const revoke = vi.fn();
    Object.assign(URL, { createObjectURL: create, revokeObjectURL: revoke });
    const clicked: { download: string; href: string }[] = [];
    vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
      clicked.push({ download: this.download, href: this.href });
    });
    const blob = new Blob(['a,b\r\n'], { type: 'text/csv' });
    downloadBlob(blob, 'log.csv');
    expect(create).toHaveBeenCalledWith(blob);
    expect(clicked).toStrictEqual([{ download: 'log.csv', href: 'blob:test/1' }]);
    expect(document.querySelector('a')).toBeNull();
    await new Promise((resolve) => setTimeout(resolve, 5));
    expect(revoke).toHaveBeenCalledWith('blob:test/1');
  });

  it('exportFileName keeps letters and drops characters file systems refuse', () => {
    expect(exportFileName('Łódź/Süd: "A" <1>', 'backup-2026-05-15', 'json')).toBe(
      'Łódź-Süd-A-1-backup-2026-05-15.json',
    );
    expect(exportFileName('   ', 'log', 'csv')).toBe('spanlog-log.csv');
  });

  it('collectInSlices yields to the event loop and reports progress, giving the same text', async () => {
    const records = fixtureLine({ spans: 40, readingsPerWire: 2 });
    const input = fixtureLogInput(records);
    const job = inspectionLogJob(input);
    const progress: { done: number; total: number }[] = [];
    let timerTurns = 0;
    const ticker = setInterval(() => (timerTurns += 1), 0);
    // A zero-millisecond slice forces a yield after every piece.
    const parts = await collectInSlices(job.parts, job.total, {
      sliceMs: 0,
      onProgress: (p) => progress.push(p),
    });
    clearInterval(ticker);
    expect(parts.join('')).toBe([...inspectionLogJob(input).parts].join(''));
    expect(progress.length).toBeGreaterThan(10);
    expect(progress.at(-1)).toStrictEqual({ done: job.total, total: job.total });
    expect(timerTurns).toBeGreaterThan(0);
  });

  it('collectInSlices stops when its signal is aborted', async () => {
    const job = inspectionLogJob(fixtureLogInput(fixtureLine({ spans: 10 })));
    const controller = new AbortController();
    const run = collectInSlices(job.parts, job.total, {
      sliceMs: 0,
      signal: controller.signal,
      onProgress: ({ done }) => {
        if (done > 3) controller.abort(new Error('stopped by test'));
      },
    });
    await expect(run).rejects.toThrow('stopped by test');
  });
});

describe('files panel', () => {
  function setup() {
    const records = fixtureLine({ spans: 2 });
    const saved: { name: string; blob: Blob }[] = [];
    Object.assign(URL, { createObjectURL: () => 'blob:test/panel', revokeObjectURL: () => undefined });
    vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
      saved.push({ name: this.download, blob: lastBlob });
    });
    let lastBlob = new Blob([]);
    const create = URL.createObjectURL.bind(URL);
    Object.assign(URL, {
      createObjectURL: (blob: Blob) => {
        lastBlob = blob;
        return create(blob);
      },
    });
    const putRaw = vi.fn((batch: Partial<RecordSet>) =>
      Promise.resolve({ written: Object.values(batch).flat().length, unchanged: 0 }),
    );
    const store = {
      exportAll: () => Promise.resolve({ records }),
      exportLine: () => Promise.resolve({ records }),
      putRaw,
      deviceId: () => 'device-panel',
    };
    let ids = 70_000;
    const container = document.createElement('div');
    document.body.append(container);
    render(
      h(ExportPanel, {
        store,
        input: fixtureLogInput(records),
        now: () => '2026-05-15T09:30:00.000Z',
        newId: () => fixtureUuid(ids++),
      }),
      container,
    );
    const button = (text: string) =>
      [...container.querySelectorAll('button')].find(
        (item) => item.textContent === text,
      ) as HTMLButtonElement;
    const chooseFile = async (label: string, text: string) => {
      const field = [...container.querySelectorAll('label')]
        .find((item) => item.textContent?.startsWith(label))
        ?.querySelector('input') as HTMLInputElement;
      Object.defineProperty(field, 'files', { value: [new Blob([text])], configurable: true });
      field.dispatchEvent(new Event('change'));
      await vi.waitFor(() =>
        expect(container.querySelector('.export-panel__done, .export-panel__failed')).not.toBeNull(),
      );
    };
    return { records, saved, putRaw, container, button, chooseFile };
  }

  it('saves the inspection log as a CSV file named after the line', async () => {
    const { saved, button, container, records } = setup();
    button('Inspection log (CSV)').click();
    await vi.waitFor(() => expect(saved).toHaveLength(1));
    expect(saved[0]?.name).toBe('Łódź–Süd feeder 日本-inspection-log-2026-05-15.csv');
    const text = await saved[0]!.blob.text();
    expect(text.split('\r\n').filter(Boolean)).toHaveLength(records.reading.length + 1);
    await vi.waitFor(() => expect(container.textContent).toContain('Inspection log saved (CSV).'));
  });

  it('a bad backup file is refused with the record named and nothing written', async () => {
    const { putRaw, chooseFile, container, records } = setup();
    const file = JSON.parse(writeBackupJson(records, '2026-05-15T09:00:00.000Z')) as {
      records: { spans: Record<string, unknown>[] };
    };
    if (file.records.spans[1]) file.records.spans[1].length = -5;
    await chooseFile('Restore from a backup', JSON.stringify(file));
    expect(putRaw).not.toHaveBeenCalled();
    expect(container.querySelector('.export-panel__failed')?.textContent).toMatch(
      /span record #2 .* "length"/,
    );
  });

  it('a span list shows its preview, and only "Add to this line" writes it', async () => {
    const { putRaw, chooseFile, container, button } = setup();
    await chooseFile(
      'Add structures from a span list',
      'structure,attachment_elevation,span_length,conductor\nQ1,10,,\nQ2,11,80,Lark\n',
    );
    expect(container.querySelectorAll('.export-panel__preview tbody tr')).toHaveLength(2);
    expect(putRaw).not.toHaveBeenCalled();
    button('Add to this line').click();
    await vi.waitFor(() => expect(putRaw).toHaveBeenCalledTimes(1));
    expect(putRaw.mock.calls[0]?.[0].structure?.map((structure) => structure.label)).toStrictEqual([
      'Q1',
      'Q2',
    ]);
  });
});
