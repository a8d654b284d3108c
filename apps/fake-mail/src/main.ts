import { parseEnv } from './env';
import { startFakeMail } from './server';

async function main(): Promise<void> {
  const env = parseEnv(process.env);
  const mail = await startFakeMail({
    smtpPort: env.FAKE_MAIL_SMTP_PORT,
    httpPort: env.FAKE_MAIL_HTTP_PORT,
    dataDir: env.FAKE_MAIL_DIR,
  });
  console.log(
    `fake-mail: SMTP smtp://127.0.0.1:${mail.smtpPort} · inbox ${mail.httpUrl}/ · data ${env.FAKE_MAIL_DIR}`,
  );

  let isClosing = false;
  const shutdown = (signal: NodeJS.Signals) => {
    if (isClosing) return;
    isClosing = true;
    mail.close().then(
      () => process.exit(0),
      (error: unknown) => {
        console.error(`fake-mail: error while stopping on ${signal}:`, errorMessage(error));
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
  console.error(`fake-mail: could not start: ${errorMessage(error)}`);
  process.exit(1);
});
