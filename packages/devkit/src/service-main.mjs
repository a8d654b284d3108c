// The entry point a local stand-in (mail sink, payment server) shares: start it, print where it listens, close it
// on SIGTERM/SIGINT, and exit 1 with one readable line when starting or stopping fails.

const messageOf = (error) => (error instanceof Error ? error.message : String(error));

/**
 * @param {string} name
 * @param {() => Promise<{ close(): Promise<void> }>} start
 * @param {(service: any) => string} describe
 */
export async function runService(name, start, describe) {
  let service;
  try {
    service = await start();
  } catch (error) {
    console.error(`${name}: could not start: ${messageOf(error)}`);
    process.exit(1);
  }
  console.log(`${name}: ${describe(service)}`);
  let isClosing = false;
  const shutdown = (signal) => {
    if (isClosing) return;
    isClosing = true;
    service.close().then(
      () => process.exit(0),
      (error) => {
        console.error(`${name}: error while stopping on ${signal}: ${messageOf(error)}`);
        process.exit(1);
      },
    );
  };
  process.on('SIGTERM', shutdown);
  process.on('SIGINT', shutdown);
}
