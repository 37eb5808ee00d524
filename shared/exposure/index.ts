export * from './mpe-limits';
export * from './duty';
export * from './oet65';
export * from './exposure-check';
