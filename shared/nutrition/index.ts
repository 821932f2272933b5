export * from './horse-class';
export * from './horse-requirements';
export * from './growing-horse';
export * from './nrc-2007-mature';
export * from './forage-floor';
