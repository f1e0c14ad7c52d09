// @ts-nocheck
import { randomUUID } from 'node:crypto';
import { mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

export interface StoredMessage {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
}

export interface Mailbox {
  list: () => Promise<StoredMessage[]>;
}

export interface FakeSmtp {
  host: string;
  port: number;
  mailbox: Mailbox;
  close: () => Promise<void>;
}

/**
 * A local SMTP server for the default set-up and the tests: it accepts every message (no TLS, no
 * password, loopback only by default) and keeps each one as an .eml file in `folder`, newest first
 * in the mailbox listing.
 */
export async function startFakeSmtp(options: { folder: string; host?: string; port?: number }): Promise<FakeSmtp> {
  mkdirSync(options.folder, { recursive: true });
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    banner: 'Tramontane local mail catcher',
    size: 5 * 1024 * 1024,
    logger: false,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('end', () => {
        const id = `${Date.now().toString().padStart(15, '0')}-${randomUUID()}`;
        const envelope = { from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '', to: session.envelope.rcptTo.map((r) => r.address) };
        writeFileSync(path.join(options.folder, `${id}.eml`), Buffer.concat(chunks));
        writeFileSync(path.join(options.folder, `${id}.json`), JSON.stringify(envelope));
        callback();
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port ?? 0, options.host ?? '127.0.0.1', () => resolve());
  });
  const address = server.server.address() as AddressInfo;
  return {
    host: address.address,
    port: address.port,
    mailbox: folderMailbox(options.folder),
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}

/** Reads what the fake SMTP server stored. */
export function folderMailbox(folder: string): Mailbox {
  return {
    list: async () => {
      let files: string[];
      try {
        files = readdirSync(folder).filter((f) => f.endsWith('.eml'));
      } catch {
        return [];
      }
      files.sort().reverse();
      return Promise.all(
        files.slice(0, 200).map(async (file) => {
          const id = file.slice(0, -4);
          const parsed = await simpleParser(readFileSync(path.join(folder, file)));
          let envelope: { from: string; to: string[] } = { from: '', to: [] };
          try {
            envelope = JSON.parse(readFileSync(path.join(folder, `${id}.json`), 'utf8'));
          } catch {
            // An .eml without its envelope file still shows, with the header addresses.
          }
          return {
            id,
            receivedAt: new Date(Number(id.split('-')[0])).toISOString(),
            from: parsed.from?.text ?? envelope.from,
            to: envelope.to.length ? envelope.to : [parsed.to ? (Array.isArray(parsed.to) ? parsed.to.map((a) => a.text).join(', ') : parsed.to.text) : ''],
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
          };
        }),
      );
    },
  };
}
