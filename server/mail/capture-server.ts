import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { Db } from '../db/connection';
import { outboxRepository } from './outbox-repository';

export const LAB_HEADER = 'x-dilutrace-lab';

const addresses = (value: AddressObject | AddressObject[] | undefined): string =>
  (Array.isArray(value) ? value : value ? [value] : []).map((a) => a.text).join(', ');

export interface CaptureServer {
  port: number;
  close(): Promise<void>;
}

/**
 * A local SMTP server on loopback that stores every message it receives in the outbox table.
 * It stands in for the lab's mail service when SMTP_URL is not set, so the whole SMTP path runs
 * with no network. It answers the client only after the row is written.
 */
export async function startCaptureServer(db: Db, now: () => Date): Promise<CaptureServer> {
  const outbox = outboxRepository(db);
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    banner: 'Dilutrace local mail capture',
    logger: false,
    size: 2 * 1024 * 1024,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then(async (mail) => {
          const labHeader = mail.headers.get(LAB_HEADER);
          const labId = labHeader ? Number(labHeader) : NaN;
          await outbox.insert({
            lab_id: Number.isInteger(labId) ? labId : null,
            message_id: mail.messageId ?? null,
            from_address: addresses(mail.from),
            to_address: addresses(mail.to),
            subject: mail.subject ?? '(no subject)',
            text_body: mail.text ?? '',
            html_body: typeof mail.html === 'string' ? mail.html : null,
            created_at: now().toISOString(),
          });
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => resolve());
  });
  const address = server.server.address();
  const port = typeof address === 'object' && address ? address.port : 0;
  return { port, close: () => new Promise((resolve) => server.close(() => resolve())) };
}
