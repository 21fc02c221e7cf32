// The entry of a sheet-rendering worker thread (piscina, sheet-renderer.ts).
// Plain JavaScript so that it starts the same under `node --import tsx`, under
// Vitest and anywhere else: tsx's tsImport compiles the TypeScript sheet code
// for this thread without registering a loader for the whole process.
import { threadId } from 'node:worker_threads';
import { tsImport } from 'tsx/esm/api';

const { renderSheet } = await tsImport('./render-sheet.tsx', import.meta.url);
const { renderPackage: putTogether } = await tsImport('./render-package.tsx', import.meta.url);

/** Renders one sheet; answers the bytes and which thread rendered them. */
export default async function render(data) {
  const pdf = await renderSheet(data);
  return { pdf: new Uint8Array(pdf.buffer, pdf.byteOffset, pdf.byteLength), threadId };
}

/** Puts an issue package together: its index, then the sheets it is given (piscina task `renderPackage`). */
export async function renderPackage(job) {
  const { pdf, indexPages, totalPages } = await putTogether(job);
  return {
    pdf: new Uint8Array(pdf.buffer, pdf.byteOffset, pdf.byteLength),
    indexPages,
    totalPages,
    threadId,
  };
}
