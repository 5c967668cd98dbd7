// Starts the mail stand-in alone: `npm run fake:mail` (SMTP on MAIL_FAKE_SMTP_PORT, web page on MAIL_FAKE_HTTP_PORT).
import { startMailFake } from './mail-fake';

const fake = await startMailFake({
  smtpPort: Number(process.env.MAIL_FAKE_SMTP_PORT ?? 2525),
  httpPort: Number(process.env.MAIL_FAKE_HTTP_PORT ?? 8025),
});
console.log(`[mail] SMTP on 127.0.0.1:${fake.smtpPort}, messages at ${fake.httpUrl}`);
const stop = () => void fake.close().then(() => process.exit(0));
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
