export * from './auth';
export * from './boats';
export * from './club';
export * from './errors';
export * from './dues';
export * from './knowledge';
export * from './exchange';
export * from './storm';
