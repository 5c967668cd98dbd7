// Integration tests run the real Express app in-process against the real test database that `npm test`
// provisioned (DATABASE_URL) and the mail stand-in (SMTP_URL, MAIL_FAKE_URL).
import { afterAll } from 'vitest';
import { closeDb } from '../../server/db/client';
import { stopJobs } from '../../server/jobs/queue';

if (!process.env.DATABASE_URL) throw new Error('DATABASE_URL is not set: run the integration tests through `npm test`');
process.env.NODE_ENV = 'test';

afterAll(async () => {
  await stopJobs().catch(() => {});
  await closeDb();
});
