/**
 * Design judgement of measured wires (issue 4): pure, SI, re-exported by core/index.ts.
 *
 * How the app uses it:
 * 1. Map the section record to a SectionDesignInput (conductor, basis, spanLengths, rulingSpanOverride,
 *    maxDesignTemperature, terrainCategory) and the project/section settings to AssessSettings (tolerance,
 *    compareState, limits, uncertainty, …; absent fields take the defaults of ./defaults, each with its source).
 * 2. For each reading: assessReading(section, { geometry, measurement, conductorTemperature, site?, id? }, settings)
 *    → ReadingAssessment: design vs measured (H, midspan and max sag), deviation with its 95 % band, verdict and
 *    reason, % of rated strength, tension limits, H/w check, hot-day clearance (hot H for the profile drawing).
 * 3. For each wire (span × wire position): assessWire(readingsOfThatWire, settings) → combined H and deviation,
 *    disagreeing readings, the wire's verdict.
 * 4. For the section: assessSection([{ id, group: wireLabel, wire }], settings) → counts by verdict, worst first,
 *    tension spread and outlier spans.
 * Everything throws SpanInputError with a specific code on impossible input; catch it per reading.
 */
export * from './types';
export * from './defaults';
export * from './state-model';
export * from './design-table';
export * from './design-state';
export * from './tolerance';
export * from './limits';
export * from './clearance';
export * from './seeded-random';
export * from './propagation';
export * from './reading-inputs';
export * from './assess-reading';
export * from './combine';
export * from './section-spread';
export * from './section-summary';
