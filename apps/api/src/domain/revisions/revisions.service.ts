import type {
  AuditAction,
  Change,
  Component,
  Integrity,
  IssuedItem,
  QueueItem,
  ReturnedItem,
  Revision,
  RevisionSummary,
  SubmittedRevision,
  VerifyResult,
  PackageVerifyResult,
  WorkflowWarning,
} from '@hoopline/contract';
import { numberedSteps, packageCode } from '@hoopline/present';
import { randomUUID } from 'node:crypto';
import type { DataSource, EntityManager } from 'typeorm';
import { ENGINE_VERSION, computeReport, parseComponent, type Report } from '@hoopline/calc';
import { toJson } from '../../db/entities/json';
import type { SignOffDecision, SignOffRemark } from '../../db/entities/revision.entity';
import { AppError, conflict, notFound, validationFailed } from '../../http/errors';
import type { Passwords } from '../../credentials/passwords';
import { userRepository } from '../../repositories/users.repository';
import { auditRepository } from '../../repositories/audit.repository';
import { pageOf, type Page, type PageRequest } from '../../http/pagination';
import {
  canDesign,
  canListReturned,
  canSignOff,
  canWithdraw,
  seesOnlyIssued,
  type Actor,
} from '../../policy/policy';
import { enforce } from '../../policy/enforce';
import { recordAudit } from '../audit/audit.service';
import { componentViews, insertRevision } from '../components/components.service';
import {
  requireComponent,
  requireRevision,
  type RevisionContext,
} from '../components/component-access';
import type { Notifier } from '../../mail/notifier';
import { projectDesignBasis, projectSite, staleVersion } from '../projects/projects.service';
import { componentRepository } from '../../repositories/components.repository';
import { projectRepository } from '../../repositories/projects.repository';
import { revisionRepository } from '../../repositories/revisions.repository';
import { iso, isoRequired } from '../iso-dates';
import { diffInputs, diffResults } from './diff';
import { computeContent, contentHash, packageHashOf, storedHashOf } from './revision-content';
import { storedGoverning } from '../components/component-table';
import { issuePackageRepository } from '../../repositories/issue-packages.repository';
import { revisionView, summaryFromRow } from './revision-views';

/** How much of a return's comment the "returned to me" list shows. */
export const COMMENT_EXCERPT_LENGTH = 200;

/** The text's first `length` characters (whole code points), an ellipsis where it was cut. */
export function excerpt(text: string, length: number): string {
  const chars = Array.from(text.trim());
  return chars.length <= length ? chars.join('') : `${chars.slice(0, length).join('').trimEnd()}…`;
}

/**
 * A return's step remarks, checked against the revision's trail: each step
 * must be one of its numbers (1…N as numberedSteps counts them), else a
 * 400 naming `remarks.<i>.step`.
 */
function remarksOnTrail(
  report: Report,
  remarks: readonly SignOffRemark[] | undefined,
): SignOffRemark[] {
  if (!remarks?.length) return [];
  const count = numberedSteps(report).length;
  const wrong = remarks.flatMap((remark, i) =>
    remark.step >= 1 && remark.step <= count
      ? []
      : [
          {
            path: `remarks.${i}.step`,
            message: `is not a step of this revision’s trail (it has steps 1 to ${count})`,
          },
        ],
  );
  if (wrong.length) throw validationFailed(wrong);
  return remarks.map(({ step, text }) => ({ step, text }));
}

/** Revisions: history, new revisions, the sign-off workflow, diff, integrity, verify. */
export class RevisionsService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly notifier: Notifier,
    private readonly passwords: Passwords,
  ) {}

  async list(actor: Actor, componentId: string, page: PageRequest): Promise<Page<RevisionSummary>> {
    const manager = this.dataSource.manager;
    const { standing } = await requireComponent(manager, actor, componentId);
    // A fabricator sees the countersigned few (a partial index holds them);
    // everyone else every revision (its total the highest number: no count).
    const { rows: found, total } = seesOnlyIssued(standing)
      ? await revisionRepository.countersignedPage(manager, componentId, page)
      : await revisionRepository.historyPage(manager, componentId, page);
    return pageOf(found.map(summaryFromRow), page, total);
  }

  /**
   * Saves new inputs as the next revision. The component's version must be
   * the one the designer started from (else 409 stale_version), and a
   * revision under check must be withdrawn or decided first.
   */
  async create(
    actor: Actor,
    componentId: string,
    input: { inputs: unknown; baseVersion: number; note?: string | undefined },
  ): Promise<{ component: Component; revision: Revision }> {
    return this.dataSource.transaction(async (manager) => {
      const { component, standing } = await requireComponent(manager, actor, componentId, {
        lock: true,
      });
      enforce(canDesign(standing));
      if (component.version !== input.baseVersion) throw staleVersion(component.version);
      const latest = component.latestRevisionId
        ? await revisionRepository.get(manager, component.latestRevisionId)
        : null;
      if (latest?.status === 'submitted') {
        throw conflict(
          'revision_under_check',
          `revision ${latest.number} is with a checker: withdraw it before saving a new one`,
        );
      }
      const content = computeContent(
        input.inputs,
        projectSite(standing.project),
        projectDesignBasis(standing.project),
        standing.project.designTemperature,
      );
      if (content.inputs['kind'] !== component.kind) {
        throw validationFailed([
          { path: 'inputs.kind', message: `must stay "${component.kind}" for this component` },
        ]);
      }
      const revision = await insertRevision(
        manager,
        actor,
        component,
        (latest?.number ?? 0) + 1,
        content,
        input.note ?? '',
      );
      const affected = await componentRepository.advance(
        manager,
        componentId,
        revision.id,
        input.baseVersion,
      );
      if (affected !== 1) throw staleVersion(component.version);
      const after = await componentRepository.get(manager, componentId);
      const [view] = await componentViews(manager, [after], false);
      return { component: view!, revision: await revisionView(manager, revision.id) };
    });
  }

  async get(actor: Actor, revisionId: string): Promise<Revision> {
    const manager = this.dataSource.manager;
    await requireRevision(manager, actor, revisionId);
    return revisionView(manager, revisionId);
  }

  /** from = the other revision, to = this one. */
  async diff(
    actor: Actor,
    revisionId: string,
    againstId: string,
  ): Promise<{
    from: RevisionSummary;
    to: RevisionSummary;
    inputs: Change[];
    results: Change[];
    verdictChanged: boolean;
  }> {
    const manager = this.dataSource.manager;
    const to = await requireRevision(manager, actor, revisionId);
    const from = await requireRevision(manager, actor, againstId);
    if (from.revision.componentId !== to.revision.componentId) {
      throw validationFailed([
        { path: 'against', message: 'must be a revision of the same component' },
      ]);
    }
    const [fromView, toView] = await Promise.all([
      revisionView(manager, againstId),
      revisionView(manager, revisionId),
    ]);
    return {
      from: summaryOnly(fromView),
      to: summaryOnly(toView),
      inputs: diffInputs(from.revision.inputs, to.revision.inputs),
      results: diffResults(from.revision.report, to.revision.report),
      verdictChanged: from.revision.verdict !== to.revision.verdict,
    };
  }

  async integrity(actor: Actor, revisionId: string): Promise<Integrity> {
    const manager = this.dataSource.manager;
    const { revision } = await requireRevision(manager, actor, revisionId);
    const recomputedHash = storedHashOf(revision);
    const signed = await revisionRepository.hashesSigned(manager, revisionId);
    let reproduces: boolean | null = null;
    if (revision.engineVersion === ENGINE_VERSION) {
      try {
        const report = toJson(computeReport(parseComponent(revision.inputs)));
        reproduces =
          contentHash({ inputs: {}, engineVersion: '', report }) ===
          contentHash({ inputs: {}, engineVersion: '', report: revision.report });
      } catch {
        reproduces = false;
      }
    }
    return {
      matches: recomputedHash === revision.contentHash,
      storedHash: revision.contentHash,
      recomputedHash,
      signOffsMatch: signed.length ? signed.every((hash) => hash === recomputedHash) : null,
      reproduces,
    };
  }

  /**
   * Submits a draft for check. On a project with no checker but the author,
   * it still submits, and the answer warns that nobody can countersign it yet
   * and names who can add a checker (the owner, administrators).
   */
  async submit(actor: Actor, revisionId: string): Promise<SubmittedRevision> {
    return this.dataSource.transaction(async (manager) => {
      const ctx = await this.lockForWorkflow(manager, actor, revisionId);
      enforce(canDesign(ctx.standing));
      if (ctx.component.latestRevisionId !== revisionId) {
        throw conflict(
          'not_latest_revision',
          'only the latest revision of a component is submitted',
        );
      }
      if (ctx.revision.status !== 'draft') {
        throw conflict(
          'revision_not_draft',
          `this revision is ${ctx.revision.status}, not a draft`,
        );
      }
      await revisionRepository.markSubmitted(manager, revisionId);
      await this.audit(manager, actor, ctx, 'revision.submitted', 'draft', 'submitted');
      await this.notifier.revisionSubmitted(manager, { revisionId });
      const view = await revisionView(manager, revisionId);
      const warning = await this.noCheckerWarning(manager, ctx, actor);
      return warning ? { ...view, warnings: [warning] } : view;
    });
  }

  async withdraw(actor: Actor, revisionId: string): Promise<Revision> {
    return this.dataSource.transaction(async (manager) => {
      const ctx = await this.lockForWorkflow(manager, actor, revisionId);
      enforce(canWithdraw(ctx.standing, ctx.revision));
      if (ctx.revision.status !== 'submitted') {
        throw conflict(
          'revision_not_submitted',
          `this revision is ${ctx.revision.status}, not submitted`,
        );
      }
      await revisionRepository.markWithdrawn(manager, revisionId);
      await this.audit(manager, actor, ctx, 'revision.withdrawn', 'submitted', 'draft');
      return revisionView(manager, revisionId);
    });
  }

  /**
   * Countersign or return, in one transaction holding the revision's row
   * lock: of several checkers racing, one decides and the others find it
   * decided (409). The decision records the hash the checker saw; it must
   * equal the stored hash, and the stored data must still produce it.
   *
   * Where the project asks for it (projects.sign_off_password, issue 16.2)
   * the checker's password is checked first, outside that transaction (argon2
   * takes its time; only the checker's own user row is locked meanwhile, so
   * their parallel guesses take turns against the count): missing is 400
   * `password_required`, wrong is 403 `wrong_password` and an audit event of
   * its own (`revision.sign_off_refused`), both naming the field `password`
   * and changing nothing else.
   */
  async decide(
    actor: Actor,
    revisionId: string,
    decision: SignOffDecision,
    input: {
      hash: string;
      comment?: string | undefined;
      remarks?: readonly SignOffRemark[] | undefined;
      password?: string | undefined;
    },
  ): Promise<Revision> {
    const confirmed = await this.confirmPassword(actor, revisionId, decision, input.password);
    return this.dataSource.transaction(async (manager) => {
      const ctx = await this.lockForWorkflow(manager, actor, revisionId);
      enforce(canSignOff(ctx.standing, ctx.revision));
      // The setting was switched on between the check above and this lock.
      if (ctx.standing.project.signOffPassword && !confirmed) throw passwordRequired();
      const { revision } = ctx;
      if (revision.status === 'countersigned' || revision.status === 'returned') {
        throw conflict('already_signed', `this revision has been ${revision.status} already`);
      }
      if (revision.status !== 'submitted') {
        throw conflict(
          'revision_not_submitted',
          'only a submitted revision is countersigned or returned',
        );
      }
      if (input.hash !== revision.contentHash) {
        throw conflict(
          'hash_mismatch',
          'the hash you signed is not this revision’s: reload it and check again',
          { currentHash: revision.contentHash },
        );
      }
      if (storedHashOf(revision) !== revision.contentHash) {
        throw conflict(
          'integrity_failed',
          'the stored data of this revision no longer matches its hash: it cannot be signed',
        );
      }
      const remarks = remarksOnTrail(revision.report as unknown as Report, input.remarks);
      const now = new Date();
      await revisionRepository.insertSignOff(manager, {
        id: randomUUID(),
        revisionId,
        checkerId: actor.id,
        decision,
        comment: input.comment ?? '',
        hashSigned: input.hash,
        createdAt: now,
        remarks,
      });
      const affected = await revisionRepository.markDecided(manager, revisionId, decision, now);
      if (affected !== 1)
        throw conflict('already_signed', 'this revision has been decided already');
      if (decision === 'countersigned') {
        await revisionRepository.supersedeOthers(manager, revision.componentId, revisionId, now);
        await componentRepository.setIssued(manager, revision.componentId, revisionId);
      }
      await this.audit(
        manager,
        actor,
        ctx,
        decision === 'countersigned' ? 'revision.countersigned' : 'revision.returned',
        'submitted',
        decision,
        {
          hashSigned: input.hash,
          ...(input.comment ? { comment: input.comment } : {}),
          ...(remarks.length ? { remarks } : {}),
        },
      );
      await this.notifier.revisionDecided(manager, {
        revisionId,
        decision,
        comment: input.comment ?? '',
        remarks,
      });
      return revisionView(manager, revisionId);
    });
  }

  /** Submitted revisions in projects where I check, not mine, oldest first. Admins sign nothing. */
  async checkQueue(actor: Actor, page: PageRequest): Promise<Page<QueueItem>> {
    const { rows: found, total } = await revisionRepository.checkQueuePage(
      this.dataSource.manager,
      actor,
      page,
    );
    return pageOf(
      found.map((r) => ({
        ...summaryFromRow(r),
        project: { id: r.p_id, number: r.p_number, name: r.p_name },
        component: { id: r.c_id, name: r.c_name, kind: r.c_kind },
      })),
      page,
      total,
    );
  }

  /**
   * "Returned to me" (issue 16.1): my revisions that a checker returned and
   * that are still their component's latest (a new revision takes one off),
   * in projects I still design in, newest return first.
   */
  async returned(actor: Actor, page: PageRequest): Promise<Page<ReturnedItem>> {
    const manager = this.dataSource.manager;
    enforce(canListReturned(actor, await revisionRepository.designsAnywhere(manager, actor.id)));
    const { rows: found, total } = await revisionRepository.returnedPage(manager, actor.id, page);
    return pageOf(
      found.map((r) => ({
        project: { id: r.p_id, number: r.p_number, name: r.p_name },
        component: { id: r.c_id, name: r.c_name, kind: r.c_kind },
        revision: summaryFromRow(r),
        returnedBy: { id: r.s_checker_id, name: r.s_checker_name },
        returnedAt: isoRequired(r.s_created_at),
        commentExcerpt: excerpt(r.s_comment, COMMENT_EXCERPT_LENGTH),
        remarkCount: Number(r.s_remark_count),
      })),
      page,
      total,
    );
  }

  /** The issued revision of every component in my projects (admins: every project). */
  async issued(
    actor: Actor,
    query: PageRequest & { q?: string | undefined },
  ): Promise<Page<IssuedItem>> {
    const manager = this.dataSource.manager;
    const { rows: found, total } = await componentRepository.issuedPage(
      manager,
      { userId: actor.id, isAdmin: actor.isAdmin, q: query.q },
      query,
    );
    const views = await componentViews(
      manager,
      await componentRepository.inOrder(
        manager,
        found.map((r) => r.id),
      ),
      true,
    );
    return pageOf(
      found.map((r, i) => ({
        project: { id: r.p_id, number: r.p_number, name: r.p_name },
        component: views[i]!,
        revision: views[i]!.issuedRevision!,
      })),
      query,
      total,
    );
  }

  /**
   * Public: does a full hash or a verify code belong to a countersigned
   * revision whose stored data still produces it? Answers only that, with
   * the project number, component name, revision number and date.
   */
  async verify(normalisedCode: string): Promise<VerifyResult> {
    const manager = this.dataSource.manager;
    const candidates = (
      await revisionRepository.countersignedByHash(manager, normalisedCode)
    ).filter((r) => storedHashOf(r) === r.contentHash);
    // A verify code shared by two different hashes cannot tell them apart: no answer.
    // The same hash on several revisions (identical inputs screened twice) names the latest.
    if (new Set(candidates.map((r) => r.contentHash)).size !== 1) return { match: false };
    const revision = candidates[0]!;
    const names = await revisionRepository.verifyNames(manager, revision);
    if (!names || !revision.decidedAt) return { match: false };
    const report = revision.report as unknown as Report;
    const inputs = report.inputs as { thickness?: unknown; material?: { name?: unknown } };
    const g = report.governing;
    return {
      match: true,
      status: revision.supersededAt ? 'superseded' : 'current',
      projectNumber: names.number,
      componentName: names.name,
      revisionNumber: revision.number,
      countersignedAt: isoRequired(revision.decidedAt),
      contentHash: revision.contentHash,
      kind: names.kind,
      thickness: typeof inputs.thickness === 'number' ? inputs.thickness : null,
      material: typeof inputs.material?.name === 'string' ? inputs.material.name : null,
      verdict: report.verdict,
      governing: g
        ? { loadCase: g.loadCase, checkLabel: g.checkLabel, utilisation: g.utilisation }
        : null,
      preparedBy: names.author,
      countersignedBy: names.checker ?? '',
    };
  }

  /**
   * Public: does a package code (its 12 digits, or the 64 of the package
   * hash) belong to an issue package whose revisions are all countersigned,
   * their stored data still giving their hashes and the set still giving the
   * package hash? Answers what the index prints, each revision's status
   * (superseded where its component has a later countersigned revision), and
   * the components countersigned since that the package does not hold.
   */
  async verifyPackage(hex: string): Promise<PackageVerifyResult> {
    const manager = this.dataSource.manager;
    const found = await issuePackageRepository.byCode(manager, hex);
    // Two packages that share a code cannot be told apart: no answer.
    if (found.length !== 1) return { match: false };
    const pkg = found[0]!;
    const held = await issuePackageRepository.revisions(manager, pkg.revision_ids);
    if (held.length !== pkg.revision_ids.length) return { match: false };
    const sound = held.every(
      (r) =>
        r.status === 'countersigned' &&
        r.countersigned_at !== null &&
        storedHashOf({ inputs: r.inputs, engineVersion: r.engine_version, report: r.report }) ===
          r.content_hash,
    );
    if (!sound) return { match: false };
    if (
      packageHashOf(
        pkg.project_id,
        held.map((r) => r.content_hash),
      ) !== pkg.hash
    ) {
      return { match: false };
    }
    const components = held.map((r) => {
      const current = r.issued_id === r.id;
      const g = storedGoverning((r.report as { governing?: unknown }).governing);
      return {
        componentName: r.c_name,
        tag: r.c_tag,
        kind: r.c_kind,
        revisionNumber: r.number,
        contentHash: r.content_hash,
        verdict: r.verdict,
        governing: g
          ? { checkLabel: g.checkLabel, loadCase: g.loadCase, utilisation: g.utilisation }
          : null,
        preparedBy: r.author,
        submittedAt: iso(r.submitted_at),
        countersignedBy: r.checker ?? '',
        countersignedAt: isoRequired(r.countersigned_at!),
        status: current ? ('current' as const) : ('superseded' as const),
        supersededBy: current ? null : r.issued_number,
      };
    });
    const since = await issuePackageRepository.issuedOutside(
      manager,
      pkg.project_id,
      pkg.revision_ids,
    );
    return {
      match: true,
      packageCode: packageCode(pkg.hash),
      packageHash: pkg.hash,
      status:
        components.some((c) => c.status === 'superseded') || since.length > 0
          ? 'superseded'
          : 'current',
      projectNumber: pkg.p_number,
      projectName: pkg.p_name,
      issuedAt: isoRequired(pkg.created_at),
      components,
      countersignedSince: since.map((c) => ({
        componentName: c.name,
        tag: c.tag,
        revisionNumber: c.number,
      })),
    };
  }

  /** Locks the component, then the revision (always in that order: no deadlocks with create). */
  private async lockForWorkflow(
    manager: EntityManager,
    actor: Actor,
    revisionId: string,
  ): Promise<RevisionContext> {
    const peek = await revisionRepository.findById(manager, revisionId);
    if (!peek) throw notFound('revision');
    await requireComponent(manager, actor, peek.componentId, { lock: true }).catch(() => {
      throw notFound('revision');
    });
    return requireRevision(manager, actor, revisionId, { lock: true });
  }

  /**
   * The password typed again at sign-off, where the project asks for it.
   * True when it was asked for and is right; false when the project does not
   * ask. Who may not sign is refused by the policy first, so nobody learns
   * anything about a password from a revision they may not sign.
   */
  private async confirmPassword(
    actor: Actor,
    revisionId: string,
    decision: SignOffDecision,
    password: string | undefined,
  ): Promise<boolean> {
    const manager = this.dataSource.manager;
    const ctx = await requireRevision(manager, actor, revisionId);
    if (!ctx.standing.project.signOffPassword) return false;
    enforce(canSignOff(ctx.standing, ctx.revision));
    if (password === undefined) throw passwordRequired();
    // Count, try and audit under the person's row lock: parallel guesses take
    // their turn, so no more than SIGN_OFF_ATTEMPTS are ever tried in the
    // window. The refusal is committed before the error goes out.
    const outcome = await this.dataSource.transaction(async (m) => {
      const user = await userRepository.lockById(m, actor.id);
      if (!user) throw notFound('user');
      // Wrong passwords are audited; too many of them recently and no more are tried.
      const refused = await auditRepository.countSince(m, {
        actorId: actor.id,
        action: 'revision.sign_off_refused',
        since: new Date(Date.now() - SIGN_OFF_ATTEMPT_WINDOW_S * 1000),
      });
      if (refused >= SIGN_OFF_ATTEMPTS) return 'too_many' as const;
      if (await this.passwords.verify(user.passwordHash, password)) return 'right' as const;
      await this.audit(
        m,
        actor,
        ctx,
        'revision.sign_off_refused',
        ctx.revision.status,
        ctx.revision.status,
        { decision, reason: 'wrong_password' },
      );
      return 'wrong' as const;
    });
    if (outcome === 'right') return true;
    if (outcome === 'too_many') {
      throw new AppError(
        429,
        'too_many_attempts',
        `your password was wrong ${SIGN_OFF_ATTEMPTS} times in ${SIGN_OFF_ATTEMPT_WINDOW_S / 60} minutes: wait, then try again`,
        [
          {
            path: 'password',
            message: `was wrong ${SIGN_OFF_ATTEMPTS} times in ${SIGN_OFF_ATTEMPT_WINDOW_S / 60} minutes: wait, then try again`,
          },
        ],
        { retryAfterSeconds: SIGN_OFF_ATTEMPT_WINDOW_S },
      );
    }
    throw new AppError(
      403,
      'wrong_password',
      'the password is wrong: nothing was signed. Type the password you sign in with.',
      [{ path: 'password', message: 'is wrong' }],
    );
  }

  private async noCheckerWarning(
    manager: EntityManager,
    ctx: RevisionContext,
    actor: Actor,
  ): Promise<WorkflowWarning | null> {
    const projectId = ctx.revision.projectId;
    // Checkers other than the author: the author never countersigns their own work.
    if ((await projectRepository.otherCheckers(manager, projectId, ctx.revision.authorId)) > 0)
      return null;
    const whoCanAdd = (await projectRepository.whoManagesMembers(manager, projectId)).map(
      (m) => m.name,
    );
    return {
      code: 'no_checker',
      message:
        (ctx.revision.authorId === actor.id
          ? 'This project has no checker other than you, so nobody can countersign this revision yet. '
          : 'This project has no checker other than the author, so nobody can countersign this revision yet. ') +
        (whoCanAdd.length
          ? `${whoCanAdd.join(', ')} can add a checker on the members page.`
          : 'An administrator can add a checker on the members page.'),
      whoCanAdd,
    };
  }

  private async audit(
    manager: EntityManager,
    actor: Actor,
    ctx: RevisionContext,
    action: AuditAction,
    before: string,
    after: string,
    extra: Record<string, unknown> = {},
  ) {
    await recordAudit(manager, {
      actorId: actor.id,
      action,
      entityType: 'revision',
      entityId: ctx.revision.id,
      projectId: ctx.revision.projectId,
      before: { status: before },
      after: {
        status: after,
        number: ctx.revision.number,
        componentId: ctx.component.id,
        ...extra,
      },
    });
  }
}

/**
 * Wrong sign-off passwords a person may type in the window before no more are
 * tried (common practice, no source: the order of sign-in limits). Counted from
 * the audit log, so every API process agrees.
 */
export const SIGN_OFF_ATTEMPTS = 5;
export const SIGN_OFF_ATTEMPT_WINDOW_S = 15 * 60;

/** The project asks for the password again at sign-off, and none came. */
function passwordRequired(): AppError {
  return new AppError(
    400,
    'password_required',
    'this project asks for your password again to countersign or return',
    [{ path: 'password', message: 'is required: this project asks for your password to sign off' }],
  );
}

function summaryOnly(v: Revision): RevisionSummary {
  return {
    id: v.id,
    number: v.number,
    status: v.status,
    verdict: v.verdict,
    contentHash: v.contentHash,
    author: v.author,
    createdAt: v.createdAt,
    submittedAt: v.submittedAt,
    decidedAt: v.decidedAt,
    superseded: v.superseded,
  };
}
