/**
 * A revision is served only when its content still matches the sha-256 recorded when it was
 * issued. The database digests the content as stored (sha-256 of its jsonb text) with every row
 * read; the canonical hash (canonicalContent.ts) is recomputed for a revision whose stored digest
 * this process has not yet verified, so each distinct stored content is hashed once, and any
 * change to the row — content or recorded hash — is hashed again. A mismatch is a loud error:
 * logged, answered 500 `integrity`, never shown as approved.
 */
import type { DataSource } from 'typeorm';
import { ApiError } from '../../http/ApiError';
import { contentSha256 } from './canonicalContent';

/** SQL select-list entries every revision read adds (`alias` is the revisions table's). */
export function integrityColumns(alias: string): string {
  return `${alias}.id AS integrity_id, ${alias}.content_sha256 AS integrity_sha256,
    encode(sha256(convert_to(${alias}.content::text, 'UTF8')), 'hex') AS integrity_digest`;
}

export interface IntegrityFields {
  integrity_id: string;
  integrity_sha256: string;
  integrity_digest: string;
  number: number;
}

/** Verified pairs: revision id → recorded hash and stored digest. Bounded; cleared when full. */
const verified = new Map<string, string>();
const MAX_VERIFIED = 20_000;

export class RevisionIntegrityError extends ApiError {
  constructor(readonly revisionNumber: number, readonly revisionId: string) {
    super(
      500,
      'integrity',
      `revision ${revisionNumber} does not match the sha-256 recorded when it was issued: its content was changed outside Sheaf, so it is not shown. Tell the administrator of this Sheaf; the record must be restored from a backup.`,
    );
  }
}

/**
 * Throws RevisionIntegrityError for the first row whose content no longer matches its recorded
 * hash. `content` is the row's content when the caller read it anyway; otherwise it is read here
 * for rows not verified before.
 */
export async function assertRevisionsIntact(
  dataSource: DataSource,
  rows: ReadonlyArray<IntegrityFields & { content?: unknown }>,
): Promise<void> {
  for (const row of rows) {
    const key = `${row.integrity_sha256}|${row.integrity_digest}`;
    if (verified.get(row.integrity_id) === key) continue;
    let content = row.content;
    let digest = row.integrity_digest;
    if (content === undefined) {
      const fresh: Array<{ content: unknown; digest: string }> = await dataSource.query(
        `SELECT content, encode(sha256(convert_to(content::text, 'UTF8')), 'hex') AS digest FROM revisions WHERE id = $1`,
        [row.integrity_id],
      );
      if (fresh[0] === undefined) continue;
      content = fresh[0].content;
      digest = fresh[0].digest;
    }
    if (contentSha256(content) !== row.integrity_sha256) throw new RevisionIntegrityError(row.number, row.integrity_id);
    if (verified.size >= MAX_VERIFIED) verified.clear();
    verified.set(row.integrity_id, `${row.integrity_sha256}|${digest}`);
  }
}

/** The same check for a revision read whole through its entity (no stored digest at hand). */
export function assertRevisionContentIntact(revision: { id: string; number: number; content: unknown; contentSha256: string }): void {
  if (contentSha256(revision.content) !== revision.contentSha256) throw new RevisionIntegrityError(revision.number, revision.id);
}
