// The six field methods as the reading form shows them: a title, one line on what to measure and where, and the
// fields each needs. Building the core Measurement from typed text lives here too (no physics: just units).
import type { MethodId } from '../../../core/types';
import type { QuantityKind } from '../../../core/units';

export interface MethodField {
  /** Draft key and input id. */
  name: string;
  label: string;
  kind: QuantityKind;
  hint?: string;
  integer?: boolean;
}

export interface MethodInfo {
  id: MethodId;
  title: string;
  /** What to measure and where, in one line. */
  what: string;
  /** Touches the wire (needs the contact caution). */
  contact: boolean;
  fields: MethodField[];
}

export const METHODS: readonly MethodInfo[] = [
  {
    id: 'midspan-sag',
    title: 'Sag at midspan',
    what: 'Halfway between the structures, measure straight down from the line joining the two attachments to the wire.',
    contact: false,
    fields: [
      { name: 'sag', label: 'Sag at midspan', kind: 'sag', hint: 'Chord to wire, measured vertically.' },
    ],
  },
  {
    id: 'offset-sag',
    title: 'Sag at a chosen point',
    what: 'Where midspan cannot be reached (road, river): note the distance from the near structure and the chord-to-wire sag there.',
    contact: false,
    fields: [
      {
        name: 'x',
        label: 'Distance from the near structure',
        kind: 'length',
        hint: 'Horizontal, along the span.',
      },
      { name: 'sag', label: 'Sag at that point', kind: 'sag', hint: 'Chord to wire, measured vertically.' },
    ],
  },
  {
    id: 'sight-line',
    title: 'Sight between two targets',
    what: 'Fix a target below each attachment and sight from one to the other so the line of sight just grazes the wire.',
    contact: false,
    fields: [
      { name: 'nearDrop', label: 'Near target below its attachment', kind: 'length' },
      { name: 'farDrop', label: 'Far target below its attachment', kind: 'length' },
    ],
  },
  {
    id: 'sight-angle',
    title: 'Angle of sight',
    what: 'Set the instrument below the near attachment, aim at the far structure and read the vertical angle of the sight that just grazes the wire.',
    contact: false,
    fields: [
      { name: 'nearDrop', label: 'Instrument below the near attachment', kind: 'length' },
      {
        name: 'angle',
        label: 'Vertical angle (up is positive)',
        kind: 'angle',
        hint: 'Degrees above horizontal.',
      },
    ],
  },
  {
    id: 'return-wave',
    title: 'Return-wave timing',
    what: 'Strike the wire near a structure and time the wave: tap at the strike and at each return felt, or count N returns in T seconds.',
    contact: true,
    fields: [
      { name: 'returns', label: 'Returns counted', kind: 'percent', integer: true },
      { name: 'seconds', label: 'Time for those returns', kind: 'time' },
    ],
  },
  {
    id: 'surveyed-points',
    title: 'Surveyed points on the wire',
    what: 'From an instrument station, shoot three or more points along the wire: slope distance and the angles to each.',
    contact: false,
    fields: [],
  },
];

export function methodInfo(id: MethodId): MethodInfo {
  return METHODS.find((method) => method.id === id) ?? METHODS[0]!;
}

export function methodTitle(id: MethodId): string {
  return methodInfo(id).title;
}

export function isMethodId(text: string | undefined): text is MethodId {
  return METHODS.some((method) => method.id === text);
}
