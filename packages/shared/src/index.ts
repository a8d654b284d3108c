export * from './auth';
export * from './boats';
export * from './club';
export * from './errors';
