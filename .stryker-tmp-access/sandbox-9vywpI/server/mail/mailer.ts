// @ts-nocheck
import nodemailer from 'nodemailer';

export interface SmtpSettings {
  host: string;
  port: number;
  /** TLS from the first byte (port 465); otherwise STARTTLS is used when the server offers it. */
  secure: boolean;
  user?: string;
  password?: string;
  /** The sender, e.g. `Tramontane <tramontane@firm.example>`. */
  from: string;
  /** Refuse to send without TLS (keep on for real servers; the local fake has none). */
  requireTls?: boolean;
}

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
}

export interface Mailer {
  send: (mail: OutgoingMail) => Promise<void>;
  close: () => void;
}

/** Sends mail over SMTP through nodemailer, to a real server or the local fake one alike. */
export function createSmtpMailer(settings: SmtpSettings): Mailer {
  const transport = nodemailer.createTransport({
    host: settings.host,
    port: settings.port,
    secure: settings.secure,
    requireTLS: settings.requireTls ?? false,
    auth: settings.user ? { user: settings.user, pass: settings.password ?? '' } : undefined,
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
  });
  return {
    send: async (mail) => {
      await transport.sendMail({ from: settings.from, ...mail });
    },
    close: () => transport.close(),
  };
}
