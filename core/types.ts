/** Shapes shared by the solver, the assessment and the app. All values SI: m, N, N/m, s, °C, rad. */

/** Near attachment at (0, 0), far attachment at (span, rise). */
export interface SpanGeometry {
  /** Horizontal distance between attachments, m, > 0. */
  span: number;
  /** Far attachment elevation minus near attachment elevation, m (negative when the far end is lower). */
  rise: number;
}

/** One field reading, in the form each method records it. */
export type Measurement =
  | { method: 'midspan-sag'; sag: number }
  | { method: 'offset-sag'; x: number; sag: number }
  | { method: 'sight-line'; nearDrop: number; farDrop: number }
  /** angle: radians above horizontal, looking from the near support toward the far support. */
  | { method: 'sight-angle'; nearDrop: number; angle: number }
  | { method: 'return-wave'; returns: number; seconds: number }
  /** z relative to the near attachment, x horizontal from the near attachment. */
  | { method: 'surveyed-points'; points: { x: number; z: number }[] };

export type MethodId = Measurement['method'];

export const METHOD_IDS: readonly MethodId[] = [
  'midspan-sag',
  'offset-sag',
  'sight-line',
  'sight-angle',
  'return-wave',
  'surveyed-points',
];

/** Everything the exact catenary says about one span at one horizontal tension. */
export interface SpanSolution {
  horizontalTension: number;
  catenaryParameter: number;
  lowPointX: number;
  midspanSag: number;
  maxSag: number;
  maxSagX: number;
  arcLength: number;
  nearSupportTension: number;
  farSupportTension: number;
  /** Tension averaged along the arc, N. */
  meanTension: number;
  /** One return-wave period (strike to first return) at this tension, s. */
  returnTime: number;
  /** RMS residual of the fit, m (surveyed-points only). */
  fitResidual?: number;
}

/** Linear-elastic, thermally expanding conductor for state change. */
export interface ElasticConductor {
  /** E·A, N. */
  axialStiffness: number;
  /** Linear thermal expansion, 1/°C. */
  expansion: number;
}
