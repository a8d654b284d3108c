// What the web app may import on its first load: vocabulary, labels and limits, with no schema library.
// The schemas live in the modules one level up (and in `@app/shared`); forms load them when first needed.
export * from './auth';
export * from './boats';
export * from './dues';
export * from './exchange';
export * from './moderation';
export * from './storm';
