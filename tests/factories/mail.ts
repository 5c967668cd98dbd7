export interface FakeMail {
  id: number;
  to: string[];
  subject: string;
  text: string;
  html: string;
}

/** Waits for mail to `to` in the mail stand-in (started by `npm test`) and returns the newest matching one. */
export async function waitForMail(to: string, match: (m: FakeMail) => boolean = () => true, timeoutMs = 8000): Promise<FakeMail> {
  const base = process.env.MAIL_FAKE_URL;
  if (!base) throw new Error('MAIL_FAKE_URL is not set: run through `npm test`');
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    const r = await fetch(`${base}/api/messages?to=${encodeURIComponent(to.toLowerCase())}`);
    const { messages } = (await r.json()) as { messages: FakeMail[] };
    const hit = messages.filter(match).at(-1);
    if (hit) return hit;
    await new Promise((res) => setTimeout(res, 100));
  }
  throw new Error(`no mail to ${to} within ${timeoutMs} ms`);
}

export function linkFrom(mail: FakeMail, pathPart: string): string {
  const m = mail.text.match(new RegExp(`https?://\\S*${pathPart}\\S*`));
  if (!m) throw new Error(`no ${pathPart} link in mail "${mail.subject}"`);
  return m[0];
}
