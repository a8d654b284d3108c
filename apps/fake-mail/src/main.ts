import { runService } from '@app/devkit/service-main';
import { parseEnv } from './env';
import { startFakeMail } from './server';

const env = parseEnv(process.env);
void runService(
  'fake-mail',
  () =>
    startFakeMail({
      smtpPort: env.FAKE_MAIL_SMTP_PORT,
      httpPort: env.FAKE_MAIL_HTTP_PORT,
      dataDir: env.FAKE_MAIL_DIR,
    }),
  (mail) =>
    `SMTP smtp://127.0.0.1:${mail.smtpPort} · inbox ${mail.httpUrl}/ · data ${env.FAKE_MAIL_DIR}`,
);
