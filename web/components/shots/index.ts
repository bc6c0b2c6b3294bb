/**
 * Instrument shot entry for the surveyed-points method.
 *
 * `<ShotList unitSystem="metric" onChange={…} locale? initialShots? span? />`
 *
 * The station (along the line from the near support, off the line, ground relative to the near attachment) and the
 * instrument height once; then shots (slope distance, vertical angle up +, horizontal angle off the line) with
 * add/remove. Each complete row shows its wire point (x along, z vs near attachment) as it is typed; a bad field
 * gets a message beside it (never NaN).
 *
 * Props:
 * - `unitSystem: 'metric' | 'us'`: lengths typed in m or ft; angles always in degrees.
 * - `onChange(value: ShotListValue)` after every edit: `{ shots: InstrumentShot[] /* SI m and rad, the record
 *   shape of core/records/reading.ts, station repeated per shot *\/; points: { x; z }[] /* m, same order *\/ }`.
 *   Only complete, valid rows are included.
 * - `locale?: string`: its decimal separator is accepted besides "." (default: navigator.language).
 * - `initialShots?: InstrumentShot[]` to reopen a saved reading (station from the first shot).
 * - `onDraftChange?(draft: ShotListDraft)` with the raw typed text after every edit, and `initialDraft?` to
 *   restore it exactly (half-typed rows and bad text included); `initialDraft` wins over `initialShots`.
 * - `span?: number` (m): points beyond the supports get a warning.
 *
 * Each shot becomes a point through core/instrument-shot.ts `shotToSpanPoint`; a point more than 1.5 m off the
 * span's vertical plane, or beyond the supports when `span` is given, gets a warning.
 */
export { ShotList, type ShotListDraft, type ShotListProps, type ShotListValue } from './ShotList';
