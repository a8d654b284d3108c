// The shared schemas and zod, for forms. Never import this module statically from a screen: load it through
// `loadSchemas()` or `lazyZodResolver()` (lib/lazy-schema.ts), so zod (about 25 KB gzipped) stays out of every
// screen's first load and arrives when a form is first checked.
// First: modules run in import order, and zod must have JIT off before the schemas below are built.
import './zod-jitless';

export * from '@app/shared';
export { z } from 'zod';
export { zodResolver } from '@hookform/resolvers/zod';
