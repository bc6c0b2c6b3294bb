// Records shared by the app, import/export and a future sync server: zod schemas, inferred types, helpers.
export { geoPositionSchema, type GeoPosition } from './common';
export * from './meta';
export * from './line';
export * from './conductor';
export * from './design';
export * from './section';
export * from './structure';
export * from './span';
export * from './wire';
export * from './measurement';
export * from './reading';
export * from './draft';
export * from './kinds';
export * from './validate';
export * from './merge';
export * from './wire-site';
