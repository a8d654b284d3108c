import type { FieldValues, Resolver } from 'react-hook-form';
import type { z } from 'zod';
import type * as FormSchemas from './form-schemas';

/** What the lazily loaded schema chunk exports: every shared schema, `z` and `zodResolver`. */
export type FormSchemaModule = typeof FormSchemas;

let loading: Promise<FormSchemaModule> | undefined;

/** Loads the schema chunk (once); forms await it before they check a value. */
export function loadFormSchemas(): Promise<FormSchemaModule> {
  loading ??= import('./form-schemas').catch((error: unknown) => {
    loading = undefined; // a failed download is tried again on the next check
    throw error;
  });
  return loading;
}

/**
 * Fetches the schema chunk when the browser is idle after the page has loaded, so a form's first check does not wait for it. Call it at
 * module level in a form that checks with `loadFormSchemas()` (lazyResolver calls it itself).
 */
const SETTLE_MS = 2000;

export function preloadFormSchemas() {
  if (typeof window === 'undefined') return;
  const start = () => void loadFormSchemas().catch(() => undefined);
  const whenIdle = () => {
    if ('requestIdleCallback' in window) window.requestIdleCallback(start, { timeout: 4000 });
    else setTimeout(start, 1500);
  };
  // Not before the page has loaded and settled: the screen's first paint must not share the network with this
  // chunk (about 80 KB). A check made sooner loads it itself (lazyResolver, loadFormSchemas).
  const later = () => setTimeout(whenIdle, SETTLE_MS);
  if (document.readyState === 'complete') later();
  else window.addEventListener('load', later, { once: true });
}

/**
 * A `useForm` resolver whose schema, and zod with it, load after the screen's first paint: the schemas stay
 * out of every route's first load. `pick` chooses (or builds) the schema from the loaded module, once.
 * Create it at module level so the form gets the same resolver on every render.
 */
export function lazyResolver<S extends z.ZodType<FieldValues, FieldValues>>(
  pick: (schemas: FormSchemaModule) => S,
): Resolver<z.input<S>, unknown, z.output<S>> {
  let resolver: Promise<Resolver<z.input<S>, unknown, z.output<S>>> | undefined;
  preloadFormSchemas();
  return async (values, context, options) => {
    resolver ??= loadFormSchemas()
      .then(
        (schemas) =>
          schemas.zodResolver(pick(schemas)) as Resolver<z.input<S>, unknown, z.output<S>>,
      )
      .catch((error: unknown) => {
        resolver = undefined;
        throw error;
      });
    return (await resolver)(values, context, options);
  };
}
