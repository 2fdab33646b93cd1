import nodemailer from 'nodemailer';
import type { Db } from '../db/knex';

export type Mail = { to: string; subject: string; text: string; html?: string };
export type Mailer = { send(mail: Mail): Promise<void> };

// Development and tests: every message lands in the outbox table, where admins can read it.
export function createOutboxMailer(db: Db, from: string): Mailer {
  const transport = nodemailer.createTransport({ jsonTransport: true });
  return {
    async send(mail) {
      await transport.sendMail({ from, ...mail });
      await db('outbox').insert({
        to_address: mail.to,
        subject: mail.subject,
        text_body: mail.text,
        html_body: mail.html ?? null,
        created_at: new Date().toISOString(),
      });
    },
  };
}

export function createSmtpMailer(url: string, from: string): Mailer {
  const transport = nodemailer.createTransport(url);
  return {
    async send(mail) {
      await transport.sendMail({ from, ...mail });
    },
  };
}
