export * from './cost-per-nutrient';
export * from './delivered-price';
export * from './distance';
export * from './freight';
export * from './order-total';
export * from './price-per-ton';
