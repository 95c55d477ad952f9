import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import Database from 'better-sqlite3';

export type LabDatabase = Database.Database;

/** The one file a lab backs up (with its -wal and -shm companions while the server runs). */
export const databaseFileName = 'cutbell-lab.sqlite';

const schema = `
CREATE TABLE IF NOT EXISTS tokens (
  id INTEGER PRIMARY KEY,
  label TEXT NOT NULL,
  token_sha256 TEXT NOT NULL UNIQUE,
  created_at TEXT NOT NULL,
  revoked_at TEXT
);
CREATE TABLE IF NOT EXISTS run_revisions (
  run_id TEXT NOT NULL,
  revision INTEGER NOT NULL,
  body BLOB NOT NULL,
  body_sha256 TEXT NOT NULL,
  title TEXT NOT NULL,
  started_at TEXT NOT NULL,
  ended_at TEXT,
  device TEXT NOT NULL,
  reading_count INTEGER NOT NULL,
  token_id INTEGER NOT NULL REFERENCES tokens(id),
  received_at TEXT NOT NULL,
  PRIMARY KEY (run_id, revision)
);
CREATE INDEX IF NOT EXISTS run_revisions_started ON run_revisions (started_at);
CREATE TABLE IF NOT EXISTS run_components (
  run_id TEXT NOT NULL,
  revision INTEGER NOT NULL,
  name TEXT NOT NULL,
  PRIMARY KEY (run_id, revision, name),
  FOREIGN KEY (run_id, revision) REFERENCES run_revisions (run_id, revision)
);
CREATE INDEX IF NOT EXISTS run_components_name ON run_components (name);
`;

/**
 * Opens (creating if needed) the lab's database in `dataDir`. WAL lets the lab view read while
 * a phone uploads; synchronous=FULL makes each committed upload survive a power cut, not only
 * a crash of the process (SQLite docs, "PRAGMA synchronous").
 */
export function openLabDatabase(dataDir: string): LabDatabase {
  mkdirSync(dataDir, { recursive: true });
  const db = new Database(join(dataDir, databaseFileName));
  db.pragma('journal_mode = WAL');
  db.pragma('synchronous = FULL');
  db.pragma('foreign_keys = ON');
  db.pragma('busy_timeout = 5000');
  db.exec(schema);
  return db;
}
