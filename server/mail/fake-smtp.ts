// A local fake SMTP server: accepts every message on loopback and keeps it in memory, so demos and tests
// can open what was sent (for example an invitation link) without a real mail service.
import { simpleParser } from 'mailparser';
import type { AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';

export type StoredMail = {
  id: number;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
};

const KEEP = 500;

export class FakeSmtp {
  private server: SMTPServer;
  private messages: StoredMail[] = [];
  private nextId = 1;
  port = 0;

  constructor() {
    this.server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS'],
      logger: false,
      onData: (stream, session, callback) => {
        simpleParser(stream)
          .then((parsed) => {
            this.store({
              from: parsed.from?.text ?? String(session.envelope.mailFrom || ''),
              to: session.envelope.rcptTo.map((r) => r.address),
              subject: parsed.subject ?? '',
              text: parsed.text ?? '',
              html: typeof parsed.html === 'string' ? parsed.html : '',
            });
            callback();
          })
          .catch((err: Error) => callback(err));
      },
    });
  }

  private store(mail: Omit<StoredMail, 'id' | 'receivedAt'>) {
    this.messages.push({ id: this.nextId++, receivedAt: new Date().toISOString(), ...mail });
    if (this.messages.length > KEEP) this.messages.shift();
  }

  /** Starts listening on 127.0.0.1 (port 0 = any free port); resolves with the port. */
  listen(port = 0): Promise<number> {
    return new Promise((resolve, reject) => {
      this.server.once('error', reject);
      this.server.listen(port, '127.0.0.1', () => {
        this.port = (this.server.server.address() as AddressInfo).port;
        resolve(this.port);
      });
    });
  }

  close(): Promise<void> {
    return new Promise((resolve) => this.server.close(() => resolve()));
  }

  /** Newest first. */
  list(): StoredMail[] {
    return [...this.messages].reverse();
  }

  get(id: number): StoredMail | undefined {
    return this.messages.find((m) => m.id === id);
  }
}
