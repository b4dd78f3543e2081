import { Router, type RequestHandler } from 'express';
import multer from 'multer';
import type { Db } from '../../db/client';
import { AppError } from '../../lib/errors';
import { requireRole } from '../../lib/session';
import { PHOTO_FIELD, PHOTO_LIMITS } from '../../../shared/photos';
import { parseId } from '../readings/readings.service';
import { deleteSlabPhoto, listSlabPhotos, reorderSlabPhotos, updateSlabPhoto, uploadPhotos } from './photos.service';

const staff = requireRole('seller', 'admin');
const mb = Math.round(PHOTO_LIMITS.maxFileBytes / 1024 / 1024);

/** multer's limit codes in plain words, with the status a client can act on. */
function fromMulter(err: unknown): unknown {
  if (!(err instanceof multer.MulterError)) return err;
  switch (err.code) {
    case 'LIMIT_FILE_SIZE':
      return new AppError(413, 'photo_too_large', `Each photo can be at most ${mb} MB. Make it smaller, or export it at a lower size, and try again.`);
    case 'LIMIT_FILE_COUNT':
      return new AppError(413, 'too_many_photos', `Send at most ${PHOTO_LIMITS.maxFilesPerUpload} photos at once.`);
    case 'LIMIT_UNEXPECTED_FILE':
      return err.field === PHOTO_FIELD
        ? new AppError(413, 'too_many_photos', `Send at most ${PHOTO_LIMITS.maxFilesPerUpload} photos at once.`)
        : new AppError(400, 'unexpected_field', `Photos must be sent in the "${PHOTO_FIELD}" field.`);
    default:
      return new AppError(400, 'bad_upload', 'The upload could not be read. Please try again.');
  }
}

// Memory storage: nothing reaches the disk until the bytes have been checked and re-encoded.
const parseUpload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: PHOTO_LIMITS.maxFileBytes, files: PHOTO_LIMITS.maxFilesPerUpload, fields: 10, parts: PHOTO_LIMITS.maxFilesPerUpload + 10 },
}).array(PHOTO_FIELD, PHOTO_LIMITS.maxFilesPerUpload);

const receivePhotos: RequestHandler = (req, res, next) => {
  parseUpload(req, res, (err?: unknown) => next(err ? fromMulter(err) : undefined));
};

/** Slab photos for the yard desk. The role check runs before the body is read, so visitors upload nothing. */
export function photoRoutes({ db, uploadsDir }: { db: Db; uploadsDir: string }) {
  const router = Router();
  const slabId = (raw: unknown) => parseId(String(raw), 'That slab');
  const photoId = (raw: unknown) => parseId(String(raw), 'That photo');

  router.get('/slabs/:id/photos', staff, async (req, res) => {
    res.json(await listSlabPhotos(db, slabId(req.params.id)));
  });
  router.post('/slabs/:id/photos', staff, receivePhotos, async (req, res) => {
    const files = Array.isArray(req.files) ? req.files : [];
    res.status(201).json(await uploadPhotos(db, uploadsDir, slabId(req.params.id), files, req.user!));
  });
  router.post('/slabs/:id/photos/order', staff, async (req, res) => {
    res.json(await reorderSlabPhotos(db, slabId(req.params.id), req.body));
  });
  router.patch('/slabs/:id/photos/:photoId', staff, async (req, res) => {
    res.json(await updateSlabPhoto(db, slabId(req.params.id), photoId(req.params.photoId), req.body));
  });
  router.delete('/slabs/:id/photos/:photoId', staff, async (req, res) => {
    res.json(await deleteSlabPhoto(db, uploadsDir, req.user!, slabId(req.params.id), photoId(req.params.photoId)));
  });
  return router;
}
