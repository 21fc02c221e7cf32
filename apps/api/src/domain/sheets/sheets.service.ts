import type { Report } from '@hoopline/calc';
import type { DataSource } from 'typeorm';
import type { SheetRenderer } from '../../sheets/sheet-renderer';
import type { SheetData } from '../../sheets/sheet-data';
import { sheetKey, type CachedSheet, type SheetCache, type SheetContent } from './sheet-cache';
import type { AttachmentsService } from '../attachments/attachments.service';
import { recordAudit } from '../audit/audit.service';
import { requireRevision } from '../components/component-access';
import type { Actor } from '../../policy/policy';
import { revisionRepository } from '../../repositories/revisions.repository';
import { iso, isoRequired } from '../iso-dates';
import { verifyCode } from '../revisions/revision-content';

export type PaperSize = 'A4' | 'LETTER';

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
    paperSize: PaperSize,
  ): Promise<{
    pdf: Buffer;
    fileName: string;
    stamp: SheetData['stamp'];
    source: SheetSource;
    renderedAt: string;
  }> {
    const manager = this.dataSource.manager;
    const { revision, component } = await requireRevision(manager, actor, revisionId);
    const facts = await revisionRepository.sheetFacts(manager, revision);
    if (!facts) throw new Error('revision without its project or author');
    const countersign = await revisionRepository.latestCountersign(manager, revisionId);
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
