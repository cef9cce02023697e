/**
 * Outgoing mail through nodemailer. Without SMTP_URL (development, tests) the
 * app starts a catching SMTP server on loopback and keeps what it receives,
 * so invitations and reset links can be read at /api/dev/outbox.
 */
import { once } from 'node:events';
import type { AddressInfo } from 'node:net';
import nodemailer from 'nodemailer';
import { SMTPServer } from 'smtp-server';

export interface Mail {
  id: number;
  from: string;
  to: string[];
  subject: string;
  text: string;
  date: string;
}

export interface Mailer {
  send(to: string, subject: string, text: string): Promise<void>;
  /** Caught mails, newest first; null when mail goes to a real host. */
  outbox(): Mail[] | null;
  close(): Promise<void>;
}

const OUTBOX_LIMIT = 500;

function decodeWords(header: string): string {
  return header.replace(/=\?utf-8\?([bq])\?([^?]*)\?=/gi, (_m, enc: string, text: string) =>
    enc.toLowerCase() === 'b'
      ? Buffer.from(text, 'base64').toString('utf8')
      : Buffer.from(
          text.replace(/_/g, ' ').replace(/=([0-9a-f]{2})/gi, (_x, h: string) => String.fromCharCode(parseInt(h, 16))),
          'latin1',
        ).toString('utf8'),
  );
}

/** Reads the single-part base64 text mails this module sends; anything else is kept as raw text. */
export function readMessage(raw: string): { subject: string; text: string } {
  const split = raw.indexOf('\r\n\r\n');
  const head = split < 0 ? raw : raw.slice(0, split);
  const body = split < 0 ? '' : raw.slice(split + 4);
  // Unfold (RFC 5322 2.2.3), then join adjacent encoded words (RFC 2047 6.2 ignores the space between them).
  const headers = head.replace(/\r\n(?=[ \t])/g, '').replace(/\?=[ \t]+=\?/g, '?==?');
  const subject = decodeWords(/^subject: (.*)$/im.exec(headers)?.[1] ?? '');
  const base64 = /^content-transfer-encoding: base64$/im.test(headers);
  return { subject, text: base64 ? Buffer.from(body.replace(/\s+/g, ''), 'base64').toString('utf8') : body };
}

async function startCatcher(keep: (mail: Omit<Mail, 'id'>) => void): Promise<{ port: number; close(): Promise<void> }> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    size: 1024 * 1024,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (c: Buffer) => chunks.push(c));
      stream.on('end', () => {
        const { subject, text } = readMessage(Buffer.concat(chunks).toString('utf8'));
        const from = session.envelope.mailFrom ? session.envelope.mailFrom.address : '';
        keep({
          from,
          to: session.envelope.rcptTo.map((r) => r.address),
          subject,
          text,
          date: new Date().toISOString(),
        });
        callback();
      });
    },
  });
  server.listen(0, '127.0.0.1');
  await once(server.server, 'listening');
  const { port } = server.server.address() as AddressInfo;
  return { port, close: () => new Promise<void>((r) => server.close(() => r())) };
}

export async function createMailer(options: { smtpUrl?: string; from: string }): Promise<Mailer> {
  const caught: Mail[] = [];
  let nextId = 1;
  const catcher = options.smtpUrl
    ? null
    : await startCatcher((mail) => {
        caught.unshift({ id: nextId++, ...mail });
        caught.length = Math.min(caught.length, OUTBOX_LIMIT);
      });
  const transport = catcher
    ? nodemailer.createTransport({ host: '127.0.0.1', port: catcher.port, secure: false, ignoreTLS: true })
    : nodemailer.createTransport(options.smtpUrl!);
  return {
    async send(to, subject, text) {
      await transport.sendMail({ from: options.from, to, subject, text, textEncoding: 'base64' });
    },
    outbox: () => (catcher ? [...caught] : null),
    async close() {
      transport.close();
      await catcher?.close();
    },
  };
}
