// The schemas forms check with, zod itself and the form resolver: one chunk, never part of a first load.
// Load it through lib/lazy-schema.ts, never import it statically (lint refuses static imports of
// '@app/shared', 'zod' and '@hookform/resolvers/zod' elsewhere in the web app).
export * from '@app/shared';
export { z } from 'zod';
export { zodResolver } from '@hookform/resolvers/zod';
