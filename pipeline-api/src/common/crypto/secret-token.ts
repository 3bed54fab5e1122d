import { createHash, randomBytes } from 'node:crypto';

/** A new high-entropy secret (256 bits, base64url), optionally with a readable prefix. */
export const newSecret = (prefix = ''): string => prefix + randomBytes(32).toString('base64url');

/**
 * The stored form of a secret. SHA-256 suffices for 256-bit random secrets (no guessing to slow
 * down, unlike passwords), and it lets the server find a row by the hash in one indexed lookup.
 */
export const hashSecret = (secret: string): string =>
  createHash('sha256').update(secret, 'utf8').digest('hex');
