import { once } from 'node:events';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import type { SMTPServer } from 'smtp-server';
import { createHttpApp } from './http-app';
import { MessageStore } from './message-store';
import { createSmtpSink } from './smtp-sink';

export type { MessageDto } from './message-store';

export const FAKE_MAIL_HOST = '127.0.0.1';

export interface FakeMailOptions {
  /** SMTP port on 127.0.0.1; 0 picks a free one. */
  smtpPort: number;
  /** HTTP port (inbox page + JSON API) on 127.0.0.1; 0 picks a free one. */
  httpPort: number;
  /** Directory holding one JSON file per message; created when missing. */
  dataDir: string;
  /** Called for SMTP or parse failures; defaults to console.error. */
  onError?: (error: Error) => void;
}

export interface FakeMail {
  smtpPort: number;
  httpPort: number;
  /** Base URL of the inbox page and JSON API, e.g. http://127.0.0.1:4326 */
  httpUrl: string;
  close(): Promise<void>;
}

/**
 * Starts the local mail sink: an SMTP server that stores every message under `dataDir`
 * and an HTTP server with the inbox page and `/api/messages`. Both bind to 127.0.0.1 only.
 * Resolves with the ports actually bound; rejects when a port is taken or `dataDir` is unusable.
 */
export async function startFakeMail(options: FakeMailOptions): Promise<FakeMail> {
  const onError = options.onError ?? ((error: Error) => console.error('fake-mail:', error.message));
  const store = await MessageStore.open(options.dataDir);

  const smtp = createSmtpSink(store, onError);
  const smtpPort = await listenSmtp(smtp, options.smtpPort);

  const http = createHttpApp(store).listen(options.httpPort, FAKE_MAIL_HOST);
  try {
    await once(http, 'listening');
  } catch (error) {
    await closeSmtp(smtp);
    throw error;
  }
  const httpPort = (http.address() as AddressInfo).port;

  return {
    smtpPort,
    httpPort,
    httpUrl: `http://${FAKE_MAIL_HOST}:${httpPort}`,
    close: () => Promise.all([closeSmtp(smtp), closeHttp(http)]).then(() => undefined),
  };
}

function listenSmtp(smtp: SMTPServer, port: number): Promise<number> {
  return new Promise((resolve, reject) => {
    const onListenError = (error: Error) => reject(error);
    smtp.server.once('error', onListenError);
    smtp.listen(port, FAKE_MAIL_HOST, () => {
      smtp.server.off('error', onListenError);
      resolve((smtp.server.address() as AddressInfo).port);
    });
  });
}

function closeSmtp(smtp: SMTPServer): Promise<void> {
  return new Promise((resolve) => smtp.close(() => resolve()));
}

function closeHttp(http: Server): Promise<void> {
  return new Promise((resolve, reject) => {
    http.close((error) => (error ? reject(error) : resolve()));
    http.closeAllConnections();
  });
}
