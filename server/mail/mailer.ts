// Sends mail through nodemailer over SMTP: to SMTP_URL when set, else to the local fake.
import nodemailer, { type Transporter } from 'nodemailer';
import { FakeSmtp } from './fake-smtp';

export type OutgoingMail = { to: string | string[]; subject: string; text: string; html: string };

export type Mailer = {
  send(mail: OutgoingMail): Promise<void>;
  /** The local fake, when it is the one in use (for the admin's dev mail page and tests). */
  fake: FakeSmtp | null;
  close(): Promise<void>;
};

export async function createMailer(opts: {
  smtpUrl?: string;
  fakePort?: number;
  from: string;
  log?: (msg: string) => void;
}): Promise<Mailer> {
  let fake: FakeSmtp | null = null;
  let transport: Transporter;
  if (opts.smtpUrl) {
    transport = nodemailer.createTransport(opts.smtpUrl);
  } else {
    fake = new FakeSmtp();
    const port = await fake.listen(opts.fakePort ?? 0);
    opts.log?.(`local mail fake listening on 127.0.0.1:${port}`);
    transport = nodemailer.createTransport({ host: '127.0.0.1', port, secure: false, ignoreTLS: true });
  }
  return {
    fake,
    async send(mail) {
      const to = Array.isArray(mail.to) ? mail.to : [mail.to];
      if (to.length === 0) return;
      await transport.sendMail({ from: opts.from, to, subject: mail.subject, text: mail.text, html: mail.html });
    },
    async close() {
      transport.close();
      await fake?.close();
    },
  };
}
