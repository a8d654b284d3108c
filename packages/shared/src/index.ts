export * from './auth';
export * from './club';
export * from './errors';
