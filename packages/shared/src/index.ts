export * from './auth';
export * from './boats';
export * from './club';
export * from './errors';
export * from './patch';
export * from './dues';
export * from './knowledge';
export * from './exchange';
