/**
 * Reads a design document of any released version: checks the envelope, validates against that version's
 * schema, then migrates step by step to the current version. Every message says where and what is accepted.
 */
import type { z } from 'zod';
import { designDocumentV1, type DesignDocumentV1 } from './v1.ts';
import { designDocumentV2, type DesignDocumentV2 } from './v2.ts';

import { CURRENT_VERSION } from './version.ts';

export { CURRENT_VERSION };
export type CurrentDocument = DesignDocumentV2;

export type DocumentResult = { ok: true; document: CurrentDocument } | { ok: false; message: string };

/** Version 1 → 2: nothing renamed; the new optional parts are simply absent. */
export function migrateV1(d: DesignDocumentV1): DesignDocumentV2 {
  const { version: _v, ...rest } = d;
  return { ...rest, version: 2 };
}

/** The first zod issue as "where: what". */
export function describeIssue(error: z.ZodError, version: number): string {
  const issue = error.issues[0];
  const where = issue && issue.path.length ? issue.path.join('.') : 'the design';
  return `Not a valid Polewright design (version ${version}): ${where}: ${issue?.message ?? 'invalid'}`;
}

/** Validates and migrates a parsed JSON value to the current document version. */
export function readDocument(json: unknown): DocumentResult {
  if (typeof json !== 'object' || json === null || Array.isArray(json)) {
    return {
      ok: false,
      message: 'Not a Polewright design: expected a JSON object with "polewright": "design".',
    };
  }
  const env = json as { polewright?: unknown; version?: unknown };
  if (env.polewright !== 'design') {
    return { ok: false, message: 'Not a Polewright design: the field "polewright" must be "design".' };
  }
  const version = env.version;
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 1) {
    return { ok: false, message: 'Not a Polewright design: "version" must be a whole number from 1.' };
  }
  if (version > CURRENT_VERSION) {
    return {
      ok: false,
      message: `This design was saved by a newer Polewright (version ${version}); this one reads versions 1 to ${CURRENT_VERSION}.`,
    };
  }
  if (version === 1) {
    const r = designDocumentV1.safeParse(json);
    return r.success
      ? { ok: true, document: migrateV1(r.data) }
      : { ok: false, message: describeIssue(r.error, 1) };
  }
  const r = designDocumentV2.safeParse(json);
  return r.success ? { ok: true, document: r.data } : { ok: false, message: describeIssue(r.error, 2) };
}
