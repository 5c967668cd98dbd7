import { createHmac } from 'node:crypto';

// source: stripe-node Webhooks (v1 scheme = lowercase hex HMAC-SHA256 over `${t}.${rawBody}`), via REFERENCES.md
export function signatureHeader(rawBody: string, secret: string, timestampSeconds: number): string {
  const v1 = createHmac('sha256', secret).update(`${timestampSeconds}.${rawBody}`, 'utf8').digest('hex');
  return `t=${timestampSeconds},v1=${v1}`;
}
