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

/** Downloads the project's component table as CSV, under the server's name. */
export async function downloadComponentsCsv(projectId: string): Promise<void> {
  const file = await apiDownload(`/projects/${projectId}/components.csv`);
  saveFile(file, 'components.csv');
}

/**
 * Downloads the project's issue package (the index, then every countersigned
 * sheet) and saves it; returns its package code as the server reports it.
 */
export async function downloadIssuePackage(
  projectId: string,
  paper: PaperSize,
): Promise<string | null> {
  const file = await apiDownload(`/projects/${projectId}/package.pdf${query({ paper })}`);
  saveFile(file, 'issue-package.pdf');
  return file.headers.get('x-hoopline-package-code');
}
