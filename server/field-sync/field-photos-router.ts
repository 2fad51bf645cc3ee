import express, { Router } from 'express';
import { z } from 'zod';
import { maxPhotoBytes, receivedBytesHeader } from '@shared/field-sync/photo-manifest';
import type { AppDependencies } from '../app-dependencies';
import { actorOf } from '../auth/actor';
import { validate } from '../http/validate';
import { chunkOffset } from './chunk-offset';
import { findOwnPhoto, uploadState } from './photo-record';
import { receivePhotoChunk } from './photo-upload';

const photoParams = z.object({ photoId: z.uuid('The photo id must be a UUID') });

/** Any body type is taken as raw bytes; a body over the photo cap is refused with 413. */
const rawChunk = express.raw({ type: () => true, limit: maxPhotoBytes });

/**
 * Resumable photo uploads: `GET` (or `HEAD`) tells how many bytes the server holds, `PUT`
 * sends the next chunk at `?offset=N`. Only photos declared by the caller's synced interviews.
 */
export function fieldPhotosRouter(deps: AppDependencies): Router {
  const { db, storage } = deps;
  const router = Router();

  router.get('/field/photos/:photoId', async (req, res) => {
    const { photoId } = validate(photoParams, req.params, 'path');
    const state = uploadState(await findOwnPhoto(db, photoId, actorOf(res).userId));
    res.setHeader(receivedBytesHeader, String(state.receivedBytes));
    res.setHeader('Cache-Control', 'no-store');
    res.json(state);
  });

  router.put('/field/photos/:photoId', rawChunk, async (req, res) => {
    const { photoId } = validate(photoParams, req.params, 'path');
    const bytes = Buffer.isBuffer(req.body) ? req.body : Buffer.alloc(0);
    const offset = chunkOffset(req.query, req.get('content-range'), bytes.length);
    const state = await receivePhotoChunk(db, storage, actorOf(res).userId, {
      photoId,
      offset,
      bytes,
    });
    res.setHeader(receivedBytesHeader, String(state.receivedBytes));
    res.json(state);
  });

  return router;
}
