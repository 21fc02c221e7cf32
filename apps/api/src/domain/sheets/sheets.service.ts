import { ENGINE_VERSION, type Report } from '@hoopline/calc';
import { defaultPaper, type UnitSystem } from '@hoopline/contract';
import { packageCode } from '@hoopline/present';
import type { DataSource, EntityManager } from 'typeorm';
import type { ComponentEntity } from '../../db/entities/component.entity';
import type { RevisionEntity } from '../../db/entities/revision.entity';
import { conflict } from '../../http/errors';
import type { PackageIndexEntry } from '../../sheets/package-data';
import type { SheetRenderer } from '../../sheets/sheet-renderer';
import type { SheetData } from '../../sheets/sheet-data';
import { sheetKey, type CachedSheet, type SheetCache, type SheetContent } from './sheet-cache';
import type { AttachmentsService } from '../attachments/attachments.service';
import { recordAudit } from '../audit/audit.service';
import { requireRevision } from '../components/component-access';
import { canSeeComponent, type Actor } from '../../policy/policy';
import { componentRepository } from '../../repositories/components.repository';
import { issuePackageRepository } from '../../repositories/issue-packages.repository';
import { requireProjectStanding } from '../projects/project-access';
import { revisionRepository } from '../../repositories/revisions.repository';
import { iso, isoRequired } from '../iso-dates';
import { packageHashOf, storedHashOf, verifyCode } from '../revisions/revision-content';

export type PaperSize = 'A4' | 'LETTER';

/**
 * The paper a sheet or package is printed on: the one asked for, else the
 * project's unit system's own (US customary: Letter; SI: A4).
 */
export function paperFor(unitSystem: UnitSystem, asked?: PaperSize): PaperSize {
  return asked ?? (defaultPaper(unitSystem) === 'letter' ? 'LETTER' : 'A4');
}

/** How a download was answered: from the cache, or rendered for it. */
export type SheetSource = 'cache' | 'rendered';

/**
 * The stamped-for-review sheet of one revision. Whoever may see the revision
 * may have its sheet: a fabricator only sees countersigned revisions, so only
 * those sheets (stamped FOR REVIEW); designers and checkers may preview any
 * other revision, stamped DRAFT. Every download is audited.
 *
 * A sheet is rendered in a worker thread (SheetRenderer) and kept by content
 * (SheetCache): the same revision, status, stamp, paper and listed
 * attachments give the same key, so the second download serves the first
 * render's bytes, and its "generated" time is when that render ran.
 */
export class SheetsService {
  /** Renders under way in this process, by key: a second request waits for the first. */
  private readonly inFlight = new Map<string, Promise<CachedSheet>>();

  constructor(
    private readonly dataSource: DataSource,
    private readonly attachments: AttachmentsService,
    private readonly publicUrl: string,
    private readonly renderer: SheetRenderer,
    /** Rendered sheets by content key (table sheet_renders). */
    private readonly cache: SheetCache,
  ) {}

  async sheet(
    actor: Actor,
    revisionId: string,
    /** Left out: the project's unit system chooses (paperFor). */
    asked?: PaperSize,
  ): Promise<{
    pdf: Buffer;
    fileName: string;
    stamp: SheetData['stamp'];
    source: SheetSource;
    renderedAt: string;
  }> {
    const manager = this.dataSource.manager;
    const { revision, component } = await requireRevision(manager, actor, revisionId);
    const { content, facts } = await this.sheetContent(manager, revision, component, asked);
    const paperSize = content.paperSize;
    const countersigned = revision.status === 'countersigned';
    const { sheet, source } = await this.cachedOrRendered(revision.id, content);
    await recordAudit(manager, {
      actorId: actor.id,
      action: 'sheet.downloaded',
      entityType: 'revision',
      entityId: revision.id,
      projectId: revision.projectId,
      after: {
        number: revision.number,
        stamp: content.stamp,
        paperSize,
        componentId: component.id,
        source,
        renderedAt: sheet.renderedAt.toISOString(),
      },
    });
    const safe = (text: string) => text.replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-+|-+$/g, '');
    const fileName = `${safe(facts.number)}_${safe(component.name) || 'component'}_rev${revision.number}${
      countersigned ? '' : '_DRAFT'
    }.pdf`;
    return {
      pdf: sheet.pdf,
      fileName,
      stamp: content.stamp,
      source,
      renderedAt: sheet.renderedAt.toISOString(),
    };
  }

  /** What the sheet of a revision prints (less the time it is generated). */
  private async sheetContent(
    manager: EntityManager,
    revision: RevisionEntity,
    component: Pick<ComponentEntity, 'id' | 'name' | 'kind' | 'tag'>,
    asked: PaperSize | undefined,
  ): Promise<{ content: SheetContent; facts: { number: string } }> {
    const facts = await revisionRepository.sheetFacts(manager, revision);
    if (!facts) throw new Error('revision without its project or author');
    // Resolved before the cache key is made: the key holds the paper printed on.
    const paperSize = paperFor(facts.unit_system, asked);
    const countersign = await revisionRepository.latestCountersign(manager, revision.id);
    const countersigned = revision.status === 'countersigned';
    const code = verifyCode(revision.contentHash);
    const content: SheetContent = {
      project: {
        number: facts.number,
        name: facts.name,
        client: facts.client,
        unitSystem: facts.unit_system,
      },
      component: { name: component.name, kind: component.kind, tag: component.tag },
      revision: {
        number: revision.number,
        status:
          countersigned && revision.supersededAt ? 'countersigned, superseded' : revision.status,
        contentHash: revision.contentHash,
        verifyCode: code,
        engineVersion: revision.engineVersion,
        createdAt: isoRequired(revision.createdAt),
        submittedAt: iso(revision.submittedAt),
        note: revision.note,
        inputs: revision.inputs,
        report: revision.report as unknown as Report,
      },
      author: { name: facts.author },
      countersign:
        countersigned && countersign
          ? {
              checker: countersign.checker,
              at: isoRequired(countersign.created_at),
              comment: countersign.comment,
              hashSigned: countersign.hash_signed,
            }
          : null,
      attachments: (
        await this.attachments.listAsOf(
          manager,
          component.id,
          countersigned ? revision.decidedAt : null,
        )
      ).map((a) => ({ name: a.name, sha256: a.sha256, size: a.size })),
      verifyUrl: `${this.publicUrl.replace(/\/+$/, '')}/verify/${code}`,
      stamp: countersigned ? 'review' : 'draft',
      paperSize,
    };
    return { content, facts };
  }

  /**
   * The issue package of a project: an index sheet, then the sheet of the
   * latest countersigned revision of every component (the same sheet, from
   * the same cache, as its own download). Components with none are listed
   * on the index as not countersigned (to those who may see them) and not
   * included. Whoever may see the project may have it: every sheet in it is
   * countersigned, which every member sees. The set is recorded under its
   * package hash (once) and each download audited, as sheet downloads are.
   */
  async issuePackage(
    actor: Actor,
    projectId: string,
    /** Left out: the project's unit system chooses (paperFor). */
    asked?: PaperSize,
  ): Promise<{
    pdf: Buffer;
    fileName: string;
    packageCode: string;
    packageHash: string;
    pages: number;
  }> {
    const manager = this.dataSource.manager;
    const standing = await requireProjectStanding(manager, actor, projectId);
    const paperSize = paperFor(standing.project.unitSystem, asked);
    const components = (await componentRepository.issuedOfProject(manager, projectId)).filter((c) =>
      canSeeComponent(standing, { hasIssuedRevision: c.issued_revision_id !== null }),
    );
    const issued = components.filter((c) => c.issued_revision_id !== null);
    if (issued.length === 0) {
      throw conflict(
        'nothing_countersigned',
        'no component of this project has a countersigned revision yet: there is nothing to issue',
      );
    }
    const facts = new Map(
      (
        await issuePackageRepository.revisions(
          manager,
          issued.map((c) => c.issued_revision_id!),
        )
      ).map((r) => [r.id, r]),
    );
    const entries: PackageIndexEntry[] = [];
    const included: Array<{ revision: RevisionEntity; content: SheetContent }> = [];
    for (const c of components) {
      const row = c.issued_revision_id ? facts.get(c.issued_revision_id) : undefined;
      const revision = c.issued_revision_id
        ? await revisionRepository.findById(manager, c.issued_revision_id)
        : null;
      if (!row || !revision || revision.status !== 'countersigned') {
        entries.push({ componentName: c.name, tag: c.tag, kind: c.kind, revision: null });
        continue;
      }
      if (storedHashOf(revision) !== revision.contentHash) {
        throw conflict(
          'integrity_failed',
          `the stored data of ${c.name} revision ${revision.number} no longer matches its hash: the package cannot be issued`,
        );
      }
      const report = revision.report as unknown as Report;
      const g = report.governing;
      entries.push({
        componentName: c.name,
        tag: c.tag,
        kind: c.kind,
        revision: {
          number: revision.number,
          contentHash: revision.contentHash,
          verifyCode: verifyCode(revision.contentHash),
          engineVersion: revision.engineVersion,
          verdict: report.verdict,
          governing: g
            ? { checkLabel: g.checkLabel, loadCase: g.loadCase, utilisation: g.utilisation }
            : null,
          preparedBy: row.author,
          submittedAt: iso(row.submitted_at),
          countersignedBy: row.checker ?? '',
          countersignedAt: isoRequired(row.countersigned_at ?? revision.decidedAt!),
        },
      });
      const { content } = await this.sheetContent(manager, revision, c, paperSize);
      included.push({ revision, content });
    }
    const packageHash = packageHashOf(
      projectId,
      included.map((i) => i.revision.contentHash),
    );
    const code = packageCode(packageHash);
    // Side by side: each goes to a sheet thread (or comes from the cache) on its own.
    const rendered = await Promise.all(
      included.map(({ revision, content }) => this.cachedOrRendered(revision.id, content)),
    );
    const sheets = rendered.map((r) => r.sheet.pdf);
    const sources: SheetSource[] = rendered.map((r) => r.source);
    const generatedAt = new Date();
    const { project } = standing;
    const { pdf, totalPages, indexPages } = await this.renderer.renderPackage({
      index: {
        project: { number: project.number, name: project.name, client: project.client },
        packageHash,
        packageCode: code,
        verifyUrl: `${this.publicUrl.replace(/\/+$/, '')}/verify/${code}`,
        engineVersion: ENGINE_VERSION,
        paperSize,
        generatedAt: generatedAt.toISOString(),
        entries,
      },
      sheets: sheets.map((b) => new Uint8Array(b.buffer, b.byteOffset, b.byteLength)),
    });
    await this.dataSource.transaction(async (tx) => {
      await issuePackageRepository.insertIfNew(tx, {
        hash: packageHash,
        projectId,
        revisionIds: included.map((i) => i.revision.id),
        createdBy: actor.id,
        createdAt: generatedAt,
      });
      await recordAudit(tx, {
        actorId: actor.id,
        action: 'package.downloaded',
        entityType: 'project',
        entityId: projectId,
        projectId,
        after: {
          packageCode: code,
          packageHash,
          paperSize,
          pages: totalPages,
          indexPages,
          revisions: included.map((i, n) => ({
            componentId: i.revision.componentId,
            revisionId: i.revision.id,
            number: i.revision.number,
            contentHash: i.revision.contentHash,
            source: sources[n],
          })),
        },
      });
    });
    const safe = (text: string) => text.replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-+|-+$/g, '');
    return {
      pdf,
      fileName: `${safe(project.number) || 'project'}_issue-package_${code}.pdf`,
      packageCode: code,
      packageHash,
      pages: totalPages,
    };
  }

  private async cachedOrRendered(
    revisionId: string,
    content: SheetContent,
  ): Promise<{ sheet: CachedSheet; source: SheetSource }> {
    const key = sheetKey(content);
    const cached = await this.cache.get(key);
    if (cached) return { sheet: cached, source: 'cache' };
    let render = this.inFlight.get(key);
    if (!render) {
      render = (async () => {
        const renderedAt = new Date();
        const { pdf } = await this.renderer.render({
          ...content,
          generatedAt: renderedAt.toISOString(),
        });
        return this.cache.put(key, revisionId, pdf, renderedAt);
      })().finally(() => this.inFlight.delete(key));
      this.inFlight.set(key, render);
    }
    return { sheet: await render, source: 'rendered' };
  }
}
