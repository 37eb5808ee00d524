export * from './cable-table';
export * from './loss';
export * from './coax-run';
