export * from './figures';
export * from './dates';
