import nodemailer, { type Transporter } from 'nodemailer';

export interface Mailer {
  send(message: { to: string; subject: string; text: string }): Promise<void>;
  close(): void;
}

/** Nodemailer over SMTP_URL in production, or over the local fake server in development and tests. */
export function createMailer(target: { url: string } | { port: number }, from: string): Mailer {
  const transport: Transporter =
    'url' in target ? nodemailer.createTransport(target.url) : nodemailer.createTransport({ host: '127.0.0.1', port: target.port, secure: false, ignoreTLS: true });
  return {
    async send({ to, subject, text }) {
      await transport.sendMail({ from, to, subject, text });
    },
    close: () => transport.close(),
  };
}
