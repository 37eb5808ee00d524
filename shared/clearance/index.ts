export * from './cautions';
export * from './planar';
export * from './types';
export * from './power-line';
export * from './public-area';
