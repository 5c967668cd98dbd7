export * from './auth';
export * from './catalog';
export * from './listings';
