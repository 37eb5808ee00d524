export * from './hlc';
export * from './clock-rules';
export * from './versions';
export * from './messages';
export * from './field-rules';
export * from './transport';
