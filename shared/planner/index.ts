export * from './feeding-methods';
export * from './hay-purchase';
export * from './herd-needs';
export * from './least-cost-plan';
