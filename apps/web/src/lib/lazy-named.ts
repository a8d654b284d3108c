import { lazy, type ComponentType } from 'react';

/**
 * `React.lazy` for a named export: the module becomes its own chunk, fetched the first time the component renders
 * (render it under a `<Suspense>`). For parts only some visitors see, so they stay out of the screen's first load.
 */
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- props are checked where the component is used
export function lazyNamed<K extends string, C extends ComponentType<any>>(
  load: () => Promise<Record<K, C>>,
  name: K,
) {
  return lazy(async () => ({ default: (await load())[name] }));
}
