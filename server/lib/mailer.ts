import nodemailer, { type Transporter } from 'nodemailer';
import { env } from '../env';
import { logger } from './logger';

let transport: Transporter | undefined;

function getTransport(): Transporter {
  transport ??= nodemailer.createTransport(env().SMTP_URL);
  return transport;
}

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html: string;
}

/** Sends over real SMTP (the local stand-in by default, a provider when SMTP_URL says so). */
export async function sendMail(msg: MailMessage): Promise<void> {
  await getTransport().sendMail({ from: env().MAIL_FROM, ...msg });
  logger.debug({ to: msg.to, subject: msg.subject }, 'mail sent');
}

const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] as string);

/** A plain mail layout: both parts carry the same words; links are shown in full in the text part. */
export function composeMail(opts: { to: string; subject: string; greeting: string; paragraphs: string[]; action?: { label: string; url: string } }): MailMessage {
  const text = [
    opts.greeting,
    '',
    ...opts.paragraphs.flatMap((p) => [p, '']),
    ...(opts.action ? [`${opts.action.label}: ${opts.action.url}`, ''] : []),
    '— Drabyard',
  ].join('\n');
  const html = `<!doctype html><html><body style="font-family:sans-serif;color:#2a2620;background:#f6f1e7;padding:24px">
<div style="max-width:560px;margin:auto;background:#fffdf8;border:1px solid #d8cfbd;padding:24px">
<p style="font-weight:bold;letter-spacing:.04em">DRABYARD</p>
<p>${escapeHtml(opts.greeting)}</p>
${opts.paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`).join('\n')}
${opts.action ? `<p><a href="${escapeHtml(opts.action.url)}" style="background:#8a3b12;color:#fff;padding:10px 16px;text-decoration:none">${escapeHtml(opts.action.label)}</a></p><p style="font-size:12px">${escapeHtml(opts.action.url)}</p>` : ''}
</div></body></html>`;
  return { to: opts.to, subject: opts.subject, text, html };
}

export function closeMailer() {
  transport?.close();
  transport = undefined;
}
