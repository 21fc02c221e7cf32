import { createHash } from 'node:crypto';
import canonicalize from 'canonicalize';
import {
  CalcInputError,
  ENGINE_VERSION,
  computeReport,
  parseComponent,
  type Report,
  type Verdict,
} from '@hoopline/calc';
import { toJson, type JsonObject } from '../../db/entities/json';
import { AppError, validationFailed } from '../../http/errors';
import type { SiteAsTyped } from '../../db/entities/project.entity';
import type { RevisionEntity } from '../../db/entities/revision.entity';
import type { DesignBasisValue } from '../projects/projects.service';

/** What a revision holds and its hash covers. */
export interface RevisionContent {
  readonly inputs: JsonObject;
  readonly engineVersion: string;
  readonly report: JsonObject;
}

/**
 * SHA-256 (hex) of the RFC 8785 (JCS) canonical JSON of
 * { inputs, engineVersion, report }: key order and number spelling cannot
 * change it, so it survives a round trip through PostgreSQL jsonb.
 */
export function contentHash(content: RevisionContent): string {
  return createHash('sha256').update(canonicalText(content), 'utf8').digest('hex');
}

/** The exact text the hash is taken over (RFC 8785 JSON Canonicalization Scheme). */
export function canonicalText(content: RevisionContent): string {
  const text = canonicalize({
    inputs: content.inputs,
    engineVersion: content.engineVersion,
    report: content.report,
  });
  if (text === undefined) throw new Error('revision content has no JSON form');
  return text;
}

/** The hash a revision's stored data gives now ('' for data that cannot be serialised). */
export function storedHashOf(
  revision: Pick<RevisionEntity, 'inputs' | 'engineVersion' | 'report'>,
): string {
  try {
    return contentHash({
      inputs: revision.inputs,
      engineVersion: revision.engineVersion,
      report: revision.report,
    });
  } catch {
    // Stored data that cannot even be serialised has been tampered with.
    return '';
  }
}

/** "xxxx-xxxx-xxxx": the first 12 hex digits of the hash, for sheets and the verify page. */
export function verifyCode(hash: string): string {
  const head = hash.slice(0, 12);
  return `${head.slice(0, 4)}-${head.slice(4, 8)}-${head.slice(8, 12)}`;
}

/**
 * An issue package's hash: SHA-256 (hex) of the canonical JSON of the
 * project id and the sorted content hashes of the revisions it holds. The
 * same set gives the same hash whatever order it was gathered in; a new
 * countersign changes the set, so the hash.
 */
export function packageHashOf(projectId: string, contentHashes: readonly string[]): string {
  const text = canonicalize({ project: projectId, revisions: [...contentHashes].sort() });
  if (text === undefined) throw new Error('a package that cannot be serialised');
  return createHash('sha256').update(text, 'utf8').digest('hex');
}

/** The calc's issues as 400 fields under `inputs.` (the body field they came in). */
export function inputIssues(error: CalcInputError, prefix = 'inputs') {
  return validationFailed(
    error.issues.map((issue) => ({
      path: issue.path ? (prefix ? `${prefix}.${issue.path}` : issue.path) : prefix,
      message: issue.message,
    })),
  );
}

/**
 * Recomputes on the server from the inputs alone (a client's numbers are
 * never taken): fills the site, the design basis and the design temperature
 * from the project when the inputs carry none (the basis only where the
 * project's differs from the engine's defaults, the temperature only where
 * the project has one, so a default project's inputs stay as typed), parses
 * with the calc (its issues become 400s under `inputs.`), computes the
 * report and stamps the engine version.
 */
export function computeContent(
  rawInputs: unknown,
  projectSite: SiteAsTyped,
  projectBasis?: DesignBasisValue,
  projectDesignTemperature?: string | number | null,
): RevisionContent {
  if (rawInputs === null || typeof rawInputs !== 'object' || Array.isArray(rawInputs)) {
    throw validationFailed([
      { path: 'inputs', message: 'must be a component object with a "kind"' },
    ]);
  }
  const inputs: Record<string, unknown> = { ...(rawInputs as Record<string, unknown>) };
  if (inputs['site'] === undefined && Object.keys(projectSite).length > 0) {
    inputs['site'] = { ...projectSite };
  }
  if (inputs['designBasis'] === undefined && projectBasis) {
    const chosen: Record<string, string> = {};
    if (projectBasis.allowableStress !== 'asme-viii-1')
      chosen['allowableStress'] = projectBasis.allowableStress;
    if (projectBasis.barometer !== 'standard') chosen['barometer'] = projectBasis.barometer;
    if (Object.keys(chosen).length > 0) inputs['designBasis'] = chosen;
  }
  if (
    inputs['designTemperature'] === undefined &&
    projectDesignTemperature !== undefined &&
    projectDesignTemperature !== null
  ) {
    inputs['designTemperature'] = projectDesignTemperature;
  }
  let report: Report;
  try {
    report = computeReport(parseComponent(inputs));
  } catch (error) {
    if (error instanceof CalcInputError) throw inputIssues(error);
    throw error;
  }
  try {
    // canonicalize refuses NaN and Infinity: a report that holds one is not a result.
    canonicalize(report);
  } catch {
    throw new AppError(
      422,
      'not_computable',
      'the engine could not produce finite results for these inputs',
    );
  }
  // The stored form: what jsonb gives back (undefined fields gone), so the
  // hash computed now is the hash recomputed later.
  const content: RevisionContent = {
    inputs: toJson(inputs),
    engineVersion: ENGINE_VERSION,
    report: toJson(report),
  };
  return content;
}

/** What a stored report says about itself, for list columns (the engine wrote it: one of its verdicts). */
export function verdictOf(report: JsonObject): Verdict {
  const verdict = report['verdict'];
  return typeof verdict === 'string' ? (verdict as Verdict) : 'no-checks';
}
