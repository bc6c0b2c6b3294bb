// Exports of a line: CSV inspection log, JSON backup, GeoJSON.
export * from './csv';
export * from './job';
export * from './inspection-log';
export * from './backup';
export * from './geojson';
export * from './assessment-result';
export * from './span-summary';
export * from './reading-result';
