export * from './mass';
export * from './money';
export * from './rounding';
export * from './bales';
