import { contentQuery, emptyBody, idParams, uploadFields } from '@hoopline/contract';
import { Router, type RequestHandler } from 'express';
import multer from 'multer';
import { actorOf } from '../auth/authenticate';
import { contentDisposition } from '../http/content-disposition';
import { AppError, validationFailed } from '../http/errors';
import { valid, validate } from '../http/validate';
import type { RouteDeps } from './route-deps';

// routes/sheets.routes.ts takes the header from here too.
export { contentDisposition };

/** One file part named `file`, held in memory up to the size limit; multer's errors become ours. */
function singleFile(maxBytes: number): RequestHandler {
  const upload = multer({
    storage: multer.memoryStorage(),
    // Keep the name exactly as sent: a name that tries to be a path is refused, not quietly cut down.
    preservePath: true,
    limits: { fileSize: maxBytes, files: 1, fields: 10, parts: 12 },
  }).single('file');
  return (req, res, next) => {
    upload(req, res, (error: unknown) => {
      if (!error) {
        next();
        return;
      }
      const code = (error as { code?: string }).code;
      if (code === 'LIMIT_FILE_SIZE') {
        next(
          new AppError(
            413,
            'file_too_large',
            `the file is larger than ${Math.round(maxBytes / 1024 / 1024)} MiB`,
            [{ path: 'file', message: `must be at most ${maxBytes} bytes` }],
          ),
        );
      } else if (code === 'LIMIT_UNEXPECTED_FILE' || code === 'LIMIT_FILE_COUNT') {
        next(
          validationFailed([
            { path: 'file', message: 'send exactly one file, in the part named "file"' },
          ]),
        );
      } else {
        next(
          validationFailed([
            { path: 'file', message: 'the upload could not be read as multipart/form-data' },
          ]),
        );
      }
    });
  };
}

/** Drawings, photos and certificates on a component. */
export function attachmentsRoutes({ config, services, signedIn }: RouteDeps): Router {
  const router = Router();

  const list = validate({ params: idParams });
  router.get('/components/:id/attachments', signedIn, list, async (req, res) => {
    const { params } = valid(req, list);
    res.json({ items: await services.attachments.list(actorOf(req), params.id) });
  });

  const upload = validate({ params: idParams, body: uploadFields });
  router.post(
    '/components/:id/attachments',
    signedIn,
    singleFile(config.storage.maxUploadBytes),
    (req, _res, next) => {
      if (!req.is('multipart/form-data')) {
        next(validationFailed([{ path: 'file', message: 'send the file as multipart/form-data' }]));
      } else if (!req.file) {
        next(validationFailed([{ path: 'file', message: 'is required' }]));
      } else next();
    },
    upload,
    async (req, res) => {
      const { params } = valid(req, upload);
      const file = req.file!;
      // Busboy hands the name over as latin1 bytes; browsers send UTF-8.
      const originalName = Buffer.from(file.originalname, 'latin1').toString('utf8');
      res.status(201).json(
        await services.attachments.upload(actorOf(req), params.id, {
          originalName,
          bytes: file.buffer,
        }),
      );
    },
  );

  const content = validate({ params: idParams, query: contentQuery });
  router.get('/attachments/:id/content', signedIn, content, async (req, res) => {
    const { params, query } = valid(req, content);
    const { attachment, bytes } = await services.attachments.content(actorOf(req), params.id);
    // Inline only for images (thumbnails); everything else downloads.
    const inline = query.disposition === 'inline' && attachment.contentType.startsWith('image/');
    res
      .status(200)
      .set({
        'content-type': attachment.contentType,
        'content-length': String(bytes.length),
        'content-disposition': contentDisposition(
          inline ? 'inline' : 'attachment',
          attachment.name,
        ),
        'x-content-type-options': 'nosniff',
        'cache-control': 'private, max-age=3600',
        etag: `"${attachment.sha256}"`,
      })
      .end(bytes);
  });

  const remove = validate({ params: idParams, body: emptyBody });
  router.delete('/attachments/:id', signedIn, remove, async (req, res) => {
    const { params } = valid(req, remove);
    await services.attachments.remove(actorOf(req), params.id);
    res.status(204).end();
  });

  return router;
}
