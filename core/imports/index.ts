// Imports into a line: JSON backup (validated, all or nothing) and span lists from CSV.
export * from './backup';
export * from './csv-table';
export * from './span-list';
