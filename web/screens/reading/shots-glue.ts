// Instrument shots kept in the draft as JSON text; turned into wire points by the core helper.
import { z } from 'zod';
import { instrumentShotSchema, type InstrumentShot } from '../../../core/records/reading';
import { shotToSpanPoint } from '../../../core/instrument-shot';
import { SpanInputError } from '../../../core/errors';

export interface ShotsRead {
  shots: InstrumentShot[] | undefined;
  points: { x: number; z: number }[];
  error: string | null;
}

const shotListSchema = z.array(instrumentShotSchema);

/** Reads the shots kept in the draft; each becomes a point (x along the span, z above the near attachment) by core. */
export function pointsFromShotsText(text: string | undefined): ShotsRead {
  if (text === undefined || text.trim() === '') return { shots: undefined, points: [], error: null };
  let parsed: unknown;
  try {
    parsed = JSON.parse(text);
  } catch {
    return {
      shots: undefined,
      points: [],
      error: 'The shot list could not be read back; enter the shots again.',
    };
  }
  const checked = shotListSchema.safeParse(parsed);
  if (!checked.success) return { shots: undefined, points: [], error: 'Some shots are incomplete.' };
  try {
    const points = checked.data.map((shot) => {
      const point = shotToSpanPoint(shot);
      return { x: point.x, z: point.z };
    });
    return { shots: checked.data, points, error: null };
  } catch (error) {
    if (error instanceof SpanInputError) return { shots: checked.data, points: [], error: error.message };
    throw error;
  }
}
