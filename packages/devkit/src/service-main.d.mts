/** Starts a local stand-in, prints `name: describe(service)`, and closes it on SIGTERM/SIGINT. */
export function runService<S extends { close(): Promise<void> }>(
  name: string,
  start: () => Promise<S>,
  describe: (service: S) => string,
): Promise<void>;
