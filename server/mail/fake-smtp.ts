import type { MailboxMessage } from '../../shared/schemas/notification';

export interface FakeSmtp {
  port: number;
  messages: MailboxMessage[];
  close(): Promise<void>;
}

const keep = 500;

/**
 * A real SMTP server on 127.0.0.1 that keeps what it receives in memory, for development and
 * tests when no SMTP_URL is set. Admins read it on the Mailbox page; nothing leaves the machine.
 * Its SMTP server is loaded only here, so a shop with a real SMTP_URL never loads it; the mail
 * parser (about 7 MB of heap) only when the first message arrives.
 */
export async function startFakeSmtp(port: number): Promise<FakeSmtp> {
  const { SMTPServer } = await import('smtp-server');
  let parser: Promise<typeof import('mailparser')> | undefined;
  const simpleParser: (typeof import('mailparser'))['simpleParser'] = (source) => (parser ??= import('mailparser')).then((mod) => mod.simpleParser(source));
  const messages: MailboxMessage[] = [];
  let nextId = 1;
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    banner: 'Boothwright development mailbox',
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((mail) => {
          const to = Array.isArray(mail.to) ? mail.to.map((a) => a.text).join(', ') : (mail.to?.text ?? '');
          messages.unshift({ id: nextId++, receivedAt: new Date().toISOString(), from: mail.from?.text ?? '', to, subject: mail.subject ?? '', text: mail.text ?? '' });
          messages.splice(keep);
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => {
      const address = server.server.address();
      resolve({ port: typeof address === 'object' && address ? address.port : port, messages, close: () => new Promise((done) => server.close(() => done())) });
    });
  });
}
