// Span-list import from CSV (parsed by papaparse). Unit factors: 1 ft = 0.3048 m exactly (NIST SP 811,
// appendix B, 1959 international yard and pound agreement). Conductor data: the project library (CPUC GO 95
// Appendix B Table 23), looked up by id and by code word.
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import {
  SPAN_LIST_COLUMNS,
  findConductor,
  previewSpanList,
  spanListTemplate,
  spanListTemplateHeader,
  type LineRecord,
  type SpanListImportOptions,
} from '../../../core';
import { expectClose } from '../../helpers/expect-close';
import { fixtureLine, fixtureUuid } from '../exports/line-fixture';

const FOOT = 0.3048;

function options(line: LineRecord, extra: Partial<SpanListImportOptions> = {}): SpanListImportOptions {
  let ids = 50_000;
  return {
    line,
    deviceId: 'office-pc',
    now: '2026-05-13T16:00:00.000Z',
    newId: () => fixtureUuid(ids++),
    ...extra,
  };
}

const metricLine = (): LineRecord => ({ ...fixtureLine({ spans: 1 }).line[0]!, unitSystem: 'metric' });
const usLine = (): LineRecord => ({ ...metricLine(), unitSystem: 'us' });

const GOOD = [
  'structure,latitude,longitude,ground_elevation,attachment_height,span_length,section,conductor,wires,required_clearance',
  'T1,46.2001,6.1402,402.5,10.5,,,,,',
  'T2,46.2009,6.1411,404.1,10.5,106.2,Mill road,acsr-partridge,A;B;C,6.1',
  'T3,46.2017,6.1420,401.8,12,98.7,,,A;B;C,6.1',
  'T4,,,399.0,12,120.4,Ridge,Drake,A|B,',
].join('\r\n');

describe('span-list import: good rows', () => {
  it('previews structures, sections, spans and wires without writing anything', () => {
    const line = metricLine();
    const preview = previewSpanList(GOOD, options(line));
    expect(preview.errors).toStrictEqual([]);
    expect(preview.ok).toBe(true);
    expect(preview.counts).toStrictEqual({ structures: 4, sections: 2, spans: 3, wires: 8 });
    const [t1, t2, t3, t4] = preview.records.structure;
    expect(t1).toMatchObject({
      label: 'T1',
      order: 1,
      groundElevation: 402.5,
      attachmentHeight: 10.5,
      lineId: line.id,
    });
    expect(t1?.position).toStrictEqual({ latitude: 46.2001, longitude: 6.1402 });
    expect(t4?.position).toBeUndefined();
    const [s12, s23, s34] = preview.records.span;
    expect(s12).toMatchObject({
      nearStructureId: t1?.id,
      farStructureId: t2?.id,
      length: 106.2,
      requiredClearance: 6.1,
    });
    expect(s23).toMatchObject({ nearStructureId: t2?.id, farStructureId: t3?.id, length: 98.7 });
    expect(s34).toMatchObject({ nearStructureId: t3?.id, farStructureId: t4?.id, length: 120.4 });
    expectClose(s12?.nearAttachmentElevation ?? 0, 413, 1e-12, 'near attachment = ground + height');
    expectClose(s12?.farAttachmentElevation ?? 0, 414.6, 1e-12, 'far attachment');
    const [mill, ridge] = preview.records.section;
    expect(mill?.name).toBe('Mill road');
    expect(s12?.sectionId).toBe(mill?.id);
    expect(s23?.sectionId).toBe(mill?.id); // empty section continues the previous one
    expect(s34?.sectionId).toBe(ridge?.id);
    expect(mill?.conductor.libraryId).toBe('acsr-partridge');
    expect(ridge?.conductor.weight).toBe(findConductor('drake')?.weight);
    expect(
      preview.records.wire.filter((wire) => wire.spanId === s34?.id).map((wire) => wire.label),
    ).toStrictEqual(['A', 'B']);
    for (const record of [...preview.records.structure, ...preview.records.span]) {
      expect(record).toMatchObject({
        revision: 1,
        deleted: false,
        deviceId: 'office-pc',
        updatedAt: '2026-05-13T16:00:00.000Z',
      });
    }
  });

  it('reads lengths in feet from the line’s unit system, or from units in the header', () => {
    const feet = [
      'structure,ground_elevation,attachment_height,span_length,conductor',
      'A,1000,35,,',
      'B,1010,35,350,Ibis',
    ].join('\n');
    const fromLine = previewSpanList(feet, options(usLine()));
    expect(fromLine.errors).toStrictEqual([]);
    expectClose(fromLine.records.span[0]?.length ?? 0, 350 * FOOT, 1e-12, 'span 350 ft');
    expectClose(fromLine.records.structure[1]?.groundElevation ?? 0, 1010 * FOOT, 1e-12, 'ground 1010 ft');
    expectClose(
      fromLine.records.span[0]?.farAttachmentElevation ?? 0,
      1045 * FOOT,
      1e-12,
      'attachment 1045 ft',
    );

    // The header's unit wins over the line's: metres in a US line, feet in a metric line.
    const mixed = [
      'structure,attachment_elevation (m),span_length (ft),conductor',
      'A,100,,',
      'B,101.5,328.084,acsr-drake',
    ].join('\n');
    const preview = previewSpanList(mixed, options(usLine()));
    expect(preview.errors).toStrictEqual([]);
    expect(preview.records.span[0]?.farAttachmentElevation).toBe(101.5);
    expectClose(preview.records.span[0]?.length ?? 0, 328.084 * FOOT, 1e-12, 'span in ft header');
  });

  it('reads a semicolon file with decimal commas, as spreadsheets in comma-decimal locales save it', () => {
    const text = [
      'structure;attachment_elevation;span_length;conductor',
      'A;100,25;;',
      'B;101,5;98,75;Partridge',
    ].join('\r\n');
    const preview = previewSpanList(text, options(metricLine()));
    expect(preview.errors).toStrictEqual([]);
    expect(preview.records.span[0]).toMatchObject({ length: 98.75, nearAttachmentElevation: 100.25 });
  });

  it('the published template reads back without errors in both unit systems', () => {
    for (const [system, line] of [
      ['metric', metricLine()],
      ['us', usLine()],
    ] as const) {
      const template = spanListTemplate(system);
      const header = Papa.parse<string[]>(template).data[0];
      expect(header).toStrictEqual(spanListTemplateHeader(system));
      expect(header).toHaveLength(SPAN_LIST_COLUMNS.length);
      const preview = previewSpanList(template, options(line));
      expect(preview.errors).toStrictEqual([]);
      expect(preview.counts).toStrictEqual({ structures: 3, sections: 1, spans: 2, wires: 6 });
      // The template's first span is 106.20 m or its equivalent in feet printed to 2 decimals (±0.005 ft).
      expectClose(
        preview.records.span[0]?.length ?? 0,
        106.2,
        system === 'us' ? 2e-5 : 1e-12,
        `${system} span`,
      );
    }
  });
});

describe('span-list import: bad rows get their own messages and nothing to write', () => {
  it('names the row and column of each problem', () => {
    const text = [
      'structure,latitude,longitude,ground_elevation,attachment_height,span_length,conductor',
      'P1,46.2,6.1,400,10,,acsr-drake',
      'P2,146.2,6.1,400,10,100,',
      'P3,46.2,,400,10,abc,',
      'P1,46.2,6.1,400,-2,0,',
      ',46.2,6.1,,,100,',
      'P6,46.2,6.1,400,10,,',
    ].join('\n');
    const preview = previewSpanList(text, options(metricLine()));
    expect(preview.ok).toBe(false);
    expect(preview.records.structure).toStrictEqual([]);
    expect(preview.records.span).toStrictEqual([]);
    const at = (row: number, column: string) =>
      preview.errors
        .filter((error) => error.row === row && error.column === column)
        .map((error) => error.message);
    expect(at(2, 'conductor')[0]).toMatch(/first structure has no span before it/);
    expect(at(3, 'latitude')[0]).toMatch(/146\.2 is outside −90…90/);
    expect(at(3, 'conductor')[0]).toMatch(/section "Section 1" needs a conductor/);
    expect(at(4, 'longitude')[0]).toMatch(/both latitude and longitude/);
    expect(at(4, 'span_length')[0]).toMatch(/"abc" is not a number/);
    expect(at(5, 'structure')[0]).toMatch(/"P1" is also on row 2/);
    expect(at(5, 'attachment_height')[0]).toMatch(/must not be negative/);
    expect(at(5, 'span_length')[0]).toMatch(/greater than zero/);
    expect(at(6, 'structure')[0]).toMatch(/give the structure number or name/);
    expect(at(6, 'attachment_elevation')[0]).toMatch(/so the span rise is known/);
    expect(at(7, 'span_length')[0]).toMatch(/length of the span from the previous structure/);
    // Sorted by row, so the preview lists them top to bottom.
    const rows = preview.errors.map((error) => error.row);
    expect(rows).toStrictEqual([...rows].sort((a, b) => a - b));
    expect(preview.rows).toHaveLength(6);
  });

  it('refuses unknown columns and units, and a header without a structure column', () => {
    const typo = previewSpanList('structure,latitute\nA,1', options(metricLine()));
    expect(typo.errors[0]?.message).toMatch(/Unknown column "latitute"/);
    const unit = previewSpanList('structure,span_length (yd)\nA,\nB,5', options(metricLine()));
    expect(unit.errors[0]).toMatchObject({ row: 1, column: 'span_length' });
    expect(unit.errors[0]?.message).toMatch(/Unit "yd" is not understood/);
    const missing = previewSpanList('label,span_length\nA,', options(metricLine()));
    expect(missing.errors.map((error) => error.message).join(' ')).toMatch(/needs a "structure" column/);
    const empty = previewSpanList('', options(metricLine()));
    expect(empty.errors[0]?.message).toMatch(/file is empty/);
  });

  it('refuses an unknown conductor, a second conductor for one section, and labels already on the line', () => {
    const records = fixtureLine({ spans: 1 });
    const existing = records.structure;
    const text = [
      'structure,attachment_elevation,span_length,section,conductor',
      'N1,100,,,',
      'N2,101,90,East,Unobtainium 9000',
      'N3,102,95,West,acsr-drake',
      'N4,103,96,West,acsr-lark',
      'S-1,104,97,West,',
    ].join('\n');
    const preview = previewSpanList(text, options(metricLine(), { existingStructures: existing }));
    const messages = preview.errors.map((error) => `${error.row}:${error.message}`);
    expect(messages).toContainEqual(expect.stringMatching(/^3:conductor: "Unobtainium 9000" is neither/));
    expect(messages).toContainEqual(
      expect.stringMatching(/^5:conductor: section "West" already has conductor Drake/),
    );
    expect(messages).toContainEqual(expect.stringMatching(/^6:structure: "S-1" is already on this line/));
  });

  it('adds spans to an existing section by name and numbers structures after the existing ones', () => {
    const records = fixtureLine({ spans: 2 });
    const section = records.section[0]!;
    const text = [
      'structure,attachment_elevation,span_length,section',
      'X1,100,,',
      `X2,100,80,"${section.name.toUpperCase()}"`,
    ].join('\n');
    const preview = previewSpanList(
      text,
      options(records.line[0]!, { existingSections: records.section, existingStructures: records.structure }),
    );
    expect(preview.errors).toStrictEqual([]);
    expect(preview.records.section).toStrictEqual([]);
    expect(preview.records.span[0]?.sectionId).toBe(section.id);
    expect(preview.records.structure.map((structure) => structure.order)).toStrictEqual([4, 5]);
  });

  it('reports a broken quote with its row', () => {
    const preview = previewSpanList('structure,notes\nA,"unclosed\n', options(metricLine()));
    expect(preview.ok).toBe(false);
    expect(preview.errors[0]?.message).toMatch(/could not be read/);
  });
});
