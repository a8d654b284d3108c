// Imported first by lib/schemas.ts, so it runs before any schema is built: zod probes `new Function` when it
// builds an object schema unless JIT is off, and our Content-Security-Policy (script-src 'self') forbids that.
import { config } from 'zod/v4/core';

config({ jitless: true });
