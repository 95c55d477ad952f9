import { createHash, randomBytes } from 'node:crypto';
import type { LabDatabase } from './labDatabase.ts';

export interface TokenInfo {
  id: number;
  label: string;
  createdAt: string;
  revokedAt: string | null;
}

/** Only the SHA-256 of a token is stored: a copied database file opens no phone's access. */
export function hashToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

/** Makes a token for one phone; the token itself is shown once and never stored. */
export function createToken(db: LabDatabase, label: string, now = new Date()): { id: number; token: string } {
  const trimmed = label.trim();
  if (trimmed === '') throw new RangeError('a token needs a label, e.g. "hood 3 phone"');
  // 32 random bytes: 256 bits, beyond guessing; base64url keeps it safe in a link.
  const token = `cb1.${randomBytes(32).toString('base64url')}`;
  const result = db
    .prepare('INSERT INTO tokens (label, token_sha256, created_at) VALUES (?, ?, ?)')
    .run(trimmed, hashToken(token), now.toISOString());
  return { id: Number(result.lastInsertRowid), token };
}

export function listTokens(db: LabDatabase): TokenInfo[] {
  const rows = db.prepare('SELECT id, label, created_at, revoked_at FROM tokens ORDER BY id').all() as {
    id: number;
    label: string;
    created_at: string;
    revoked_at: string | null;
  }[];
  return rows.map((r) => ({ id: r.id, label: r.label, createdAt: r.created_at, revokedAt: r.revoked_at }));
}

/** Revokes a token at once; the runs it uploaded stay. Returns false when there is no such token. */
export function revokeToken(db: LabDatabase, id: number, now = new Date()): boolean {
  const result = db.prepare('UPDATE tokens SET revoked_at = ? WHERE id = ? AND revoked_at IS NULL').run(now.toISOString(), id);
  if (result.changes > 0) return true;
  return db.prepare('SELECT 1 FROM tokens WHERE id = ?').get(id) !== undefined;
}

/** The live token matching `token`, or null. */
export function findToken(db: LabDatabase, token: string): TokenInfo | null {
  const row = db
    .prepare('SELECT id, label, created_at, revoked_at FROM tokens WHERE token_sha256 = ? AND revoked_at IS NULL')
    .get(hashToken(token)) as { id: number; label: string; created_at: string; revoked_at: string | null } | undefined;
  return row ? { id: row.id, label: row.label, createdAt: row.created_at, revokedAt: row.revoked_at } : null;
}
