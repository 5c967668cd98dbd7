export * from './auth';
export * from './catalog';
export * from './listings';
export * from './orders';
export * from './garage';
