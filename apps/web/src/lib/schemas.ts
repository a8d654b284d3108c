// The shared schemas and zod, for forms. Never import this module statically from a screen: load it through
// `loadSchemas()` or `lazyZodResolver()` (lib/lazy-schema.ts), so zod (about 25 KB gzipped) stays out of every
// screen's first load and arrives when a form is first checked.
import { config } from 'zod/v4/core';

// Every parse runs without JIT: zod would otherwise probe `new Function`, which our Content-Security-Policy
// (script-src 'self') forbids.
config({ jitless: true });

export * from '@app/shared';
export { z } from 'zod';
export { zodResolver } from '@hookform/resolvers/zod';
