import { idParams, packageQuery, sheetQuery } from '@hoopline/contract';
import { Router } from 'express';
import { actorOf } from '../auth/authenticate';
import { valid, validate } from '../http/validate';
import { contentDisposition } from './attachments.routes';
import type { RouteDeps } from './route-deps';

/** The stamped-for-review PDF sheet of a revision, and a project's issue package. */
export function sheetsRoutes({ services, signedIn }: RouteDeps): Router {
  const router = Router();
  const sheet = validate({ params: idParams, query: sheetQuery });
  router.get('/revisions/:id/sheet.pdf', signedIn, sheet, async (req, res) => {
    const { params, query } = valid(req, sheet);
    const { pdf, fileName, stamp, source, renderedAt } = await services.sheets.sheet(
      actorOf(req),
      params.id,
      query.paper,
    );
    res
      .status(200)
      .set({
        'content-type': 'application/pdf',
        'content-length': String(pdf.length),
        'content-disposition': contentDisposition('attachment', fileName),
        'cache-control': 'private, no-store',
        'x-hoopline-stamp': stamp,
        // Whether this download was rendered for it or served from the cache, and when it was rendered.
        'x-hoopline-sheet-source': source,
        'x-hoopline-sheet-rendered-at': renderedAt,
      })
      .end(pdf);
  });

  const issuePackage = validate({ params: idParams, query: packageQuery });
  router.get('/projects/:id/package.pdf', signedIn, issuePackage, async (req, res) => {
    const { params, query } = valid(req, issuePackage);
    const { pdf, fileName, packageCode, pages } = await services.sheets.issuePackage(
      actorOf(req),
      params.id,
      query.paper,
    );
    res
      .status(200)
      .set({
        'content-type': 'application/pdf',
        'content-length': String(pdf.length),
        'content-disposition': contentDisposition('attachment', fileName),
        'cache-control': 'private, no-store',
        'x-hoopline-package-code': packageCode,
        'x-hoopline-package-pages': String(pages),
      })
      .end(pdf);
  });
  return router;
}
