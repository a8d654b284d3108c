import { parseEnv } from './env';
import { startFakePayments } from './server';

async function main(): Promise<void> {
  const env = parseEnv(process.env);
  const payments = await startFakePayments({
    port: env.FAKE_PAYMENTS_PORT,
    dataDir: env.FAKE_PAYMENTS_DIR,
    webhookUrl: env.FAKE_PAYMENTS_WEBHOOK_URL,
    webhookSecret: env.STRIPE_WEBHOOK_SECRET,
    apiKey: env.STRIPE_SECRET_KEY,
    publicUrl: env.FAKE_PAYMENTS_PUBLIC_URL,
  });
  console.log(
    `fake-payments: API ${payments.url}/v1 · checkout pages ${env.FAKE_PAYMENTS_PUBLIC_URL ?? payments.url}/pay/… · webhooks → ${env.FAKE_PAYMENTS_WEBHOOK_URL} · data ${env.FAKE_PAYMENTS_DIR}`,
  );

  let isClosing = false;
  const shutdown = (signal: NodeJS.Signals) => {
    if (isClosing) return;
    isClosing = true;
    payments.close().then(
      () => process.exit(0),
      (error: unknown) => {
        console.error(`fake-payments: error while stopping on ${signal}:`, errorMessage(error));
        process.exit(1);
      },
    );
  };
  process.on('SIGTERM', shutdown);
  process.on('SIGINT', shutdown);
}

function errorMessage(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}

main().catch((error: unknown) => {
  console.error(`fake-payments: could not start: ${errorMessage(error)}`);
  process.exit(1);
});
