// Outgoing e-mail through nodemailer over SMTP (the local catcher in development and tests).
import nodemailer from 'nodemailer';
import type { Logger } from 'pino';

export type OutgoingMail = { to: string; subject: string; text: string };
export type Mailer = { send(mail: OutgoingMail): Promise<boolean> };

export function createMailer(smtpUrl: string, from: string, logger: Logger): Mailer {
  const transport = nodemailer.createTransport(smtpUrl);
  return {
    // A failed send is logged, never fatal: the action that wanted the mail has already been saved.
    async send(mail) {
      try {
        await transport.sendMail({ from, ...mail });
        return true;
      } catch (err) {
        logger.warn({ err, to: mail.to, subject: mail.subject }, 'mail not sent');
        return false;
      }
    },
  };
}
