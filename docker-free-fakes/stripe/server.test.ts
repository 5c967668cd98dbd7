import { spawn } from 'node:child_process';
import { createServer } from 'node:net';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const serverPath = fileURLToPath(new URL('./server.ts', import.meta.url));
const tsxCli = fileURLToPath(new URL('../../node_modules/tsx/dist/cli.mjs', import.meta.url));

async function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const probe = createServer();
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      probe.close(() => resolve(port));
    });
  });
}

describe('server.ts CLI', () => {
  it('when started with STRIPE_FAKE_PORT, then it logs one start line, answers, and exits cleanly on SIGTERM', async () => {
    const port = await freePort();
    const child = spawn(process.execPath, [tsxCli, serverPath], {
      env: { ...process.env, STRIPE_FAKE_PORT: String(port), STRIPE_WEBHOOK_URL: '' },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let output = '';
    child.stdout.on('data', (chunk: Buffer) => {
      output += chunk.toString();
    });
    child.stderr.on('data', (chunk: Buffer) => {
      output += chunk.toString();
    });
    const deadline = Date.now() + 15_000;
    while (!output.includes('listening') && Date.now() < deadline) await new Promise((r) => setTimeout(r, 50));
    expect(output).toContain(`stripe fake listening on http://127.0.0.1:${port}`);

    const res = await fetch(`http://127.0.0.1:${port}/v1/customers`, { headers: { Authorization: 'Bearer sk_test_cli' } });
    expect(res.status).toBe(200);

    const exited = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)));
    child.kill('SIGTERM');
    expect(await exited).toBe(0);
    expect(output.trim().split('\n')).toHaveLength(1);
  }, 30_000);
});
