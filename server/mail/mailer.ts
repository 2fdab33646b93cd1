import nodemailer from 'nodemailer';
import type { Db } from '../db/knex';
import { insertOutboxMail } from './outbox.repo';

export type Mail = { to: string; subject: string; text: string; html?: string };
export type Mailer = { send(mail: Mail): Promise<void> };

// Development and tests: every message lands in the outbox table, where admins can read it.
export function createOutboxMailer(db: Db, from: string): Mailer {
  const transport = nodemailer.createTransport({ jsonTransport: true });
  return {
    async send(mail) {
      await transport.sendMail({ from, ...mail });
      await insertOutboxMail(db, mail);
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
