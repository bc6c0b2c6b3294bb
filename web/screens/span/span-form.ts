// Span geometry form: typed text ↔ span and structure records. Rise is derived, never typed.
import type { RecordSet } from '../../../core/records/kinds';
import type { SpanRecord } from '../../../core/records/span';
import type { StructureRecord } from '../../../core/records/structure';
import type { UnitSystem } from '../../../core/units';
import type { DraftValues } from '../../app/drafts';
import { fieldText } from '../../app/format';
import { positionToDraft } from '../../app/geolocation';
import { readField, type FieldRead } from '../../app/read-field';

export type GeometryMode = 'elevations' | 'heights';

/** Draft values for a span being edited (or a fresh one after `previous`, the span before it in the section). */
export function spanDraftStart(
  records: RecordSet,
  span: SpanRecord | undefined,
  units: UnitSystem,
  previous: SpanRecord | undefined,
): DraftValues {
  const structure = (id: string | undefined): StructureRecord | undefined =>
    records.structure.find((item) => item.id === id);
  const near = structure(span?.nearStructureId ?? previous?.farStructureId);
  const far = structure(span?.farStructureId);
  const hasHeights = near?.attachmentHeight !== undefined && near.groundElevation !== undefined;
  const nearAttachment = span?.nearAttachmentElevation ?? previous?.farAttachmentElevation;
  return {
    nearLabel: near?.label ?? '',
    farLabel: far?.label ?? '',
    length: fieldText(span?.length, 'length', units),
    mode: hasHeights && span === undefined ? 'heights' : 'elevations',
    nearAttachment: fieldText(nearAttachment, 'length', units),
    farAttachment: fieldText(span?.farAttachmentElevation, 'length', units),
    nearGround: fieldText(span?.nearGroundElevation ?? near?.groundElevation, 'length', units),
    farGround: fieldText(span?.farGroundElevation ?? far?.groundElevation, 'length', units),
    nearHeight: fieldText(near?.attachmentHeight, 'length', units),
    farHeight: fieldText(far?.attachmentHeight, 'length', units),
    clearance: fieldText(span?.requiredClearance, 'length', units),
    wires: span ? '' : 'A',
    notes: span?.notes ?? '',
    ...positionToDraft('near', near?.position),
    ...positionToDraft('far', far?.position),
  };
}

export interface SpanFormRead {
  length: FieldRead;
  nearAttachment: FieldRead;
  farAttachment: FieldRead;
  nearGround: FieldRead;
  farGround: FieldRead;
  nearHeight: FieldRead;
  farHeight: FieldRead;
  clearance: FieldRead;
  /** Attachment elevations, whichever way they were entered; undefined until both are known. */
  nearElevation: number | undefined;
  farElevation: number | undefined;
  labelErrors: { nearLabel: string | null; farLabel: string | null };
}

/** Reads every field; `submitted` turns missing required values into messages. */
export function readSpanForm(values: DraftValues, units: UnitSystem, submitted: boolean): SpanFormRead {
  const heights = values.mode === 'heights';
  const need = { required: submitted };
  const length = readField(values.length, 'length', units, { ...need, positive: true });
  const nearGround = readField(values.nearGround, 'length', units, heights ? need : {});
  const farGround = readField(values.farGround, 'length', units, heights ? need : {});
  const nearHeight = readField(
    values.nearHeight,
    'length',
    units,
    heights ? { ...need, nonNegative: true } : {},
  );
  const farHeight = readField(
    values.farHeight,
    'length',
    units,
    heights ? { ...need, nonNegative: true } : {},
  );
  const nearAttachment = readField(values.nearAttachment, 'length', units, heights ? {} : need);
  const farAttachment = readField(values.farAttachment, 'length', units, heights ? {} : need);
  const clearance = readField(values.clearance, 'length', units, { nonNegative: true });
  const sum = (a: FieldRead, b: FieldRead): number | undefined =>
    a.value !== undefined && b.value !== undefined ? a.value + b.value : undefined;
  const nearLabel = (values.nearLabel ?? '').trim();
  const farLabel = (values.farLabel ?? '').trim();
  return {
    length,
    nearAttachment,
    farAttachment,
    nearGround,
    farGround,
    nearHeight,
    farHeight,
    clearance,
    nearElevation: heights ? sum(nearGround, nearHeight) : nearAttachment.value,
    farElevation: heights ? sum(farGround, farHeight) : farAttachment.value,
    labelErrors: {
      nearLabel: submitted && nearLabel === '' ? 'Give the structure number or name.' : null,
      farLabel:
        submitted && farLabel === ''
          ? 'Give the structure number or name.'
          : nearLabel !== '' && nearLabel === farLabel
            ? 'The far structure must differ from the near one.'
            : null,
    },
  };
}

/** True when every field read cleanly and the geometry is complete. */
export function spanFormComplete(read: SpanFormRead): boolean {
  const fields = [
    read.length,
    read.nearAttachment,
    read.farAttachment,
    read.nearGround,
    read.farGround,
    read.nearHeight,
    read.farHeight,
    read.clearance,
  ];
  return (
    fields.every((field) => field.error === null) &&
    read.length.value !== undefined &&
    read.nearElevation !== undefined &&
    read.farElevation !== undefined &&
    read.labelErrors.nearLabel === null &&
    read.labelErrors.farLabel === null
  );
}
