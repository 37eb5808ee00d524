export * from './common';
export * from './roles';
export * from './identity';
export * from './records';
export * from './photo-upload';
export * from './notification-settings';
