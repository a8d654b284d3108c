import { runService } from '@app/devkit/service-main';
import { parseEnv } from './env';
import { startFakePayments } from './server';

const env = parseEnv(process.env);
void runService(
  'fake-payments',
  () =>
    startFakePayments({
      port: env.FAKE_PAYMENTS_PORT,
      dataDir: env.FAKE_PAYMENTS_DIR,
      webhookUrl: env.FAKE_PAYMENTS_WEBHOOK_URL,
      webhookSecret: env.STRIPE_WEBHOOK_SECRET,
      apiKey: env.STRIPE_SECRET_KEY,
      publicUrl: env.FAKE_PAYMENTS_PUBLIC_URL,
    }),
  (payments) =>
    `API ${payments.url}/v1 · checkout pages ${env.FAKE_PAYMENTS_PUBLIC_URL ?? payments.url}/pay/… · webhooks → ${env.FAKE_PAYMENTS_WEBHOOK_URL} · data ${env.FAKE_PAYMENTS_DIR}`,
);
