import nodemailer from 'nodemailer';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startMailFake, type MailFake } from './mail-fake';

describe('mail stand-in', () => {
  let fake: MailFake;
  beforeAll(async () => {
    fake = await startMailFake({ smtpPort: 0, httpPort: 0 });
  });
  afterAll(() => fake.close());

  it('when a message is sent over SMTP, then the JSON API returns its text and HTML parts', async () => {
    const t = nodemailer.createTransport(`smtp://127.0.0.1:${fake.smtpPort}`);
    await t.sendMail({ from: 'a@drabyard.test', to: 'Someone@Example.test', subject: 'Hi', text: 'plain body', html: '<p>html body</p>' });
    t.close();
    const r = await fetch(`${fake.httpUrl}/api/messages?to=someone@example.test`);
    const { messages } = (await r.json()) as { messages: Array<{ subject: string; text: string; html: string }> };
    expect(messages).toHaveLength(1);
    expect(messages[0].subject).toBe('Hi');
    expect(messages[0].text).toContain('plain body');
    expect(messages[0].html).toContain('<p>html body</p>');
    const page = await (await fetch(`${fake.httpUrl}/`)).text();
    expect(page).toContain('Hi');
  });
});
