import { randomUUID } from 'node:crypto';
import { In } from 'typeorm';
import { addCoatPhotoFieldsSchema, type AddCoatPhotoFields, type CoatPhoto } from '../../shared/schemas/coat-photo';
import type { SiteData } from '../data/site-data';
import type { CoatPhotoEntity } from '../db/entities/coat-photo.entity';
import { AppError, notFound } from '../lib/app-error';
import { systemClock, type Clock } from '../lib/clock';
import type { FileStorage, StoredContent } from './file-storage';
import type { Upload } from './files';
import { assertRunsSpraySession, type SpraySessionRunner } from './spray-session-runner';

export const maxPhotoBytes = 10 * 1024 * 1024;

/** The image kinds a tablet camera gives and every browser shows, told by their first bytes, never by the name or the browser's word. */
export function imageTypeOf(bytes: Buffer): { mimeType: string; extension: string } | null {
  if (bytes.length >= 3 && bytes[0] === 0xff && bytes[1] === 0xd8 && bytes[2] === 0xff) return { mimeType: 'image/jpeg', extension: 'jpg' };
  if (bytes.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]))) return { mimeType: 'image/png', extension: 'png' };
  if (bytes.subarray(0, 4).toString('latin1') === 'RIFF' && bytes.subarray(8, 12).toString('latin1') === 'WEBP') return { mimeType: 'image/webp', extension: 'webp' };
  return null;
}

function toPhotoDto(photo: CoatPhotoEntity, shownWithCoatId: number): CoatPhoto {
  const { id, coatId, subject, caption, mimeType, sizeBytes, takenByName, takenAt } = photo;
  return { id, coatId, shownWithCoatId, subject: subject as CoatPhoto['subject'], caption, mimeType, sizeBytes, takenByName, takenAt, url: `/api/coat-photos/${id}` };
}

/**
 * Photos of coats (a defect, a sample board), each its own append-only record pointing at the coat
 * version it was taken with, so the coat record never changes. A photo is shown with every later
 * version of its coat. They belong to the coat's site; the bytes live in the shop's file storage.
 */
export function createCoatPhotoService(data: SiteData, storage: FileStorage, clock: Clock = systemClock) {
  /** Each asked-for coat with the ids of the versions it replaces, back to the first. */
  async function versionsOf(coatIds: number[]): Promise<Map<number, number>> {
    const shownWith = new Map<number, number>();
    for (const coatId of coatIds) {
      let coat = await data.coats.findOneBy({ id: coatId });
      for (let depth = 0; coat && depth < 50; depth++) {
        if (!shownWith.has(coat.id)) shownWith.set(coat.id, coatId);
        coat = coat.replacesId === null ? null : await data.coats.findOneBy({ id: coat.replacesId });
      }
    }
    return shownWith;
  }

  return {
    async add(coatId: number, fields: AddCoatPhotoFields, upload: Upload | undefined, runner: SpraySessionRunner): Promise<CoatPhoto> {
      const { subject, caption } = addCoatPhotoFieldsSchema.parse(fields);
      if (!upload) throw new AppError('validation_failed', 'Choose a photo to upload', { file: 'Take or choose a photo' });
      const type = imageTypeOf(upload.buffer);
      if (!type) throw new AppError('validation_failed', 'That file is not a photo Boothwright can show', { file: 'Only JPEG, PNG or WebP photos' });
      const photo = await data.transaction(async (tx) => {
        const coat = await tx.coats.findOneBy({ id: coatId });
        if (!coat) throw notFound('Coat record');
        await assertRunsSpraySession(tx, coat.spraySessionId, runner);
        const storedName = `photo-${randomUUID()}.${type.extension}`;
        await storage.put(storedName, upload.buffer, type.mimeType);
        const row = { coatId, subject, caption, storedName, mimeType: type.mimeType, sizeBytes: upload.size, takenById: runner.id, takenByName: runner.name, takenAt: clock.now().toISOString() };
        return tx.coatPhotos.save(tx.coatPhotos.create(row));
      });
      return toPhotoDto(photo, coatId);
    },

    /** The photos of these coats and of the versions each one corrects. */
    async forCoats(coatIds: number[]): Promise<CoatPhoto[]> {
      const shownWith = await versionsOf(coatIds);
      if (shownWith.size === 0) return [];
      const photos = await data.coatPhotos.find({ where: { coatId: In([...shownWith.keys()]) }, order: { takenAt: 'ASC', id: 'ASC' } });
      return photos.map((p) => toPhotoDto(p, shownWith.get(p.coatId)!));
    },

    async open(id: number): Promise<{ photo: CoatPhotoEntity; content: StoredContent }> {
      const photo = await data.coatPhotos.findOneBy({ id });
      if (!photo) throw notFound('Photo');
      const content = await storage.open(photo.storedName);
      if (!content) throw new AppError('not_found', 'The photo is recorded but missing from the file storage');
      return { photo, content };
    },
  };
}

export type CoatPhotoService = ReturnType<typeof createCoatPhotoService>;
