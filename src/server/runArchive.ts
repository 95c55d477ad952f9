import { createHash } from 'node:crypto';
import type { LabDatabase } from './labDatabase.ts';
import type { LabRunItem } from '../run/index.ts';
import type { RunSummaryFields } from './validateRunRecord.ts';

export type PutOutcome = 'stored' | 'already-stored' | 'conflict';

/** The list's row, as the phone reads it (src/run/labRunItem.ts). */
export type RunListItem = LabRunItem;

export interface RunListQuery {
  /** Inclusive lower bound on the start time (ISO 8601). */
  fromIso?: string | null;
  /** Exclusive upper bound on the start time (ISO 8601). */
  beforeIso?: string | null;
  component?: string | null;
  limit: number;
  offset: number;
}

export interface StoredRevision {
  body: Buffer;
  revision: number;
  revisions: number;
}

export const componentKey = (name: string): string => name.trim().toLowerCase();

/**
 * Keeps every revision of every run exactly as uploaded (the bytes, not a re-serialisation),
 * so a fetch gives back what the phone sent. The same run and revision twice is one row; the
 * same key with other content is a conflict, never an overwrite.
 */
export function putRevision(
  db: LabDatabase,
  revision: number,
  body: Buffer,
  summary: RunSummaryFields,
  tokenId: number,
  now = new Date(),
): PutOutcome {
  const sha = createHash('sha256').update(body).digest('hex');
  const insert = db.transaction((): PutOutcome => {
    const existing = db
      .prepare('SELECT body_sha256 FROM run_revisions WHERE run_id = ? AND revision = ?')
      .get(summary.id, revision) as { body_sha256: string } | undefined;
    if (existing) return existing.body_sha256 === sha ? 'already-stored' : 'conflict';
    db.prepare(
      `INSERT INTO run_revisions (run_id, revision, body, body_sha256, title, started_at, ended_at, device, reading_count, token_id, received_at)
       VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)`,
    ).run(
      summary.id,
      revision,
      body,
      sha,
      summary.title,
      new Date(summary.startedAt).toISOString(),
      summary.endedAt === null ? null : new Date(summary.endedAt).toISOString(),
      summary.device,
      summary.readingCount,
      tokenId,
      now.toISOString(),
    );
    const addComponent = db.prepare('INSERT OR IGNORE INTO run_components (run_id, revision, name) VALUES (?, ?, ?)');
    for (const name of summary.components) addComponent.run(summary.id, revision, componentKey(name));
    return 'stored';
  });
  return insert.immediate();
}

interface ListRow {
  run_id: string;
  revision: number;
  revisions: number;
  title: string;
  started_at: string;
  ended_at: string | null;
  device: string;
  reading_count: number;
  uploaded_by: string;
  received_at: string;
  components: string | null;
}

/** Runs, newest start first, each at its newest revision. */
export function listRuns(db: LabDatabase, query: RunListQuery): { runs: RunListItem[]; total: number } {
  const where = `
    WHERE (:from IS NULL OR r.started_at >= :from)
      AND (:before IS NULL OR r.started_at < :before)
      AND (:component IS NULL OR EXISTS (
        SELECT 1 FROM run_components c WHERE c.run_id = r.run_id AND c.revision = r.revision AND c.name = :component))`;
  const newest = `
    FROM run_revisions r
    JOIN (SELECT run_id, MAX(revision) AS newest, COUNT(*) AS revisions FROM run_revisions GROUP BY run_id) n
      ON n.run_id = r.run_id AND n.newest = r.revision
    JOIN tokens t ON t.id = r.token_id`;
  const params = {
    from: query.fromIso ?? null,
    before: query.beforeIso ?? null,
    component: query.component ? componentKey(query.component) : null,
  };
  const rows = db
    .prepare(
      `SELECT r.run_id, r.revision, n.revisions, r.title, r.started_at, r.ended_at, r.device, r.reading_count,
              t.label AS uploaded_by, r.received_at,
              (SELECT json_group_array(name) FROM run_components c WHERE c.run_id = r.run_id AND c.revision = r.revision) AS components
       ${newest} ${where}
       ORDER BY r.started_at DESC, r.run_id DESC LIMIT :limit OFFSET :offset`,
    )
    .all({ ...params, limit: query.limit, offset: query.offset }) as ListRow[];
  const { total } = db.prepare(`SELECT COUNT(*) AS total ${newest} ${where}`).get(params) as { total: number };
  return {
    total,
    runs: rows.map((row) => ({
      id: row.run_id,
      revision: row.revision,
      revisions: row.revisions,
      title: row.title,
      startedAt: row.started_at,
      endedAt: row.ended_at,
      device: row.device,
      components: row.components ? (JSON.parse(row.components) as string[]) : [],
      readingCount: row.reading_count,
      uploadedBy: row.uploaded_by,
      receivedAt: row.received_at,
    })),
  };
}

/** One revision's bytes (the newest when `revision` is null), or null. */
export function getRevision(db: LabDatabase, runId: string, revision: number | null): StoredRevision | null {
  const row = db
    .prepare(
      `SELECT body, revision, (SELECT COUNT(*) FROM run_revisions WHERE run_id = :id) AS revisions
       FROM run_revisions WHERE run_id = :id AND (:revision IS NULL OR revision = :revision)
       ORDER BY revision DESC LIMIT 1`,
    )
    .get({ id: runId, revision }) as { body: Buffer; revision: number; revisions: number } | undefined;
  return row ? { body: row.body, revision: row.revision, revisions: row.revisions } : null;
}
