import type { Mail } from '../mail/mailer';

const escape = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

export function passwordLinkMail(purpose: 'invite' | 'reset', to: string, name: string, link: string): Mail {
  const intro = purpose === 'invite' ? 'You have been invited to Motewalk.' : 'A password reset was requested for your Motewalk account.';
  const subject = purpose === 'invite' ? 'Your Motewalk invitation' : 'Reset your Motewalk password';
  const text = `Hello ${name},\n\n${intro}\nSet your password here (the link works once and expires in 72 hours):\n\n${link}\n`;
  const html = `<p>Hello ${escape(name)},</p><p>${intro}</p><p><a href="${escape(link)}">Set your password</a> (works once, expires in 72 hours).</p>`;
  return { to, subject, text, html };
}
