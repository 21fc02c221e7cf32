import { apiDownload, query, saveFile } from './client';
import type { PaperSize } from '@hoopline/contract';

/**
 * Downloads the stamped sheet of a revision (FOR REVIEW when countersigned,
 * DRAFT otherwise: the server decides) and saves it under the server's name.
 * Returns the stamp the server reports.
 */
export async function downloadSheet(
  revision: { id: string; number: number },
  paper: PaperSize,
): Promise<'review' | 'draft' | null> {
  const file = await apiDownload(`/revisions/${revision.id}/sheet.pdf${query({ paper })}`);
  saveFile(file, `revision-${revision.number}.pdf`);
  const stamp = file.headers.get('x-hoopline-stamp');
  return stamp === 'review' || stamp === 'draft' ? stamp : null;
}
