import { simpleParser } from 'mailparser';
import type { AddressObject, ParsedMail } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { SMTPServerAddress } from 'smtp-server';
import type { MessageStore, NewMessage } from './message-store';

const MAX_MESSAGE_BYTES = 25 * 1024 * 1024;

/**
 * An SMTP server that accepts every message (any or no credentials, no TLS)
 * and hands the parsed result to the store.
 */
export function createSmtpSink(store: MessageStore, onError: (error: Error) => void): SMTPServer {
  const server = new SMTPServer({
    secure: false,
    disabledCommands: ['STARTTLS'],
    authOptional: true,
    allowInsecureAuth: true,
    logger: false,
    banner: 'Rodewise local mail sink',
    size: MAX_MESSAGE_BYTES,
    // Clients that keep a connection open must not hold up a shutdown for long.
    closeTimeout: 2000,
    onAuth(auth, _session, callback) {
      callback(null, { user: auth.username ?? 'anonymous' });
    },
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => store.add(toNewMessage(parsed, session.envelope.rcptTo)))
        .then(() => callback())
        .catch((error: unknown) => {
          const failure = error instanceof Error ? error : new Error(String(error));
          onError(failure);
          callback(failure);
        });
    },
  });
  server.on('error', onError);
  return server;
}

function toNewMessage(parsed: ParsedMail, rcptTo: SMTPServerAddress[]): NewMessage {
  const envelopeTo = rcptTo.map((r) => r.address.toLowerCase());
  const headerTo = addressesOf(parsed.to).concat(addressesOf(parsed.cc));
  return {
    from: parsed.from?.text ?? '',
    // Envelope recipients include Bcc; header recipients cover a message relayed without them.
    to: [...new Set([...envelopeTo, ...headerTo])],
    subject: parsed.subject ?? '',
    text: parsed.text ?? '',
    html: typeof parsed.html === 'string' ? parsed.html : null,
    messageId: parsed.messageId?.replace(/^<|>$/g, '') ?? null,
  };
}

function addressesOf(field: AddressObject | AddressObject[] | undefined): string[] {
  if (!field) return [];
  const objects = Array.isArray(field) ? field : [field];
  return objects.flatMap((o) =>
    o.value.flatMap((a) => (a.address ? [a.address.toLowerCase()] : [])),
  );
}
