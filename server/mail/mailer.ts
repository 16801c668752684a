import nodemailer from 'nodemailer';
import { LAB_HEADER } from './capture-server';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html: string;
  /** The lab the message concerns; the capture outbox lists it under that lab. */
  labId: number | null;
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
  close(): void;
}

/** Sends through nodemailer over SMTP: the lab's server, or the local capture server. */
export function createSmtpMailer(smtpUrl: string, from: string): Mailer {
  const transport = nodemailer.createTransport(smtpUrl);
  return {
    async send(mail) {
      await transport.sendMail({
        from,
        to: mail.to,
        subject: mail.subject,
        text: mail.text,
        html: mail.html,
        headers: mail.labId == null ? {} : { [LAB_HEADER]: String(mail.labId) },
      });
    },
    close: () => transport.close(),
  };
}
