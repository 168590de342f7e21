import { randomUUID } from 'node:crypto';
import type { FileRef } from '../../shared/schemas/product';
import type { SiteData } from '../data/site-data';
import type { StoredFileEntity } from '../db/entities/stored-file.entity';
import { AppError, notFound } from '../lib/app-error';
import { systemClock, type Clock } from '../lib/clock';
import { LocalDiskStorage, type FileStorage, type StoredContent } from './file-storage';

export const maxUploadBytes = 20 * 1024 * 1024;

export interface Upload {
  originalname: string;
  buffer: Buffer;
  size: number;
}

/** A PDF starts with "%PDF-" (ISO 32000-1 §7.5.2); the file name and the browser's type are not trusted. */
export function isPdf(buffer: Buffer): boolean {
  return buffer.subarray(0, 5).toString('latin1') === '%PDF-';
}

// Keep the name people see readable (any script), but never let it carry a path, control
// characters or invisible format characters (a right-to-left override can disguise an extension).
export function cleanOriginalName(name: string): string {
  const base = name.normalize('NFC').split(/[\\/]/).pop() ?? '';
  const cleaned = [...base]
    .filter((c) => !/[\p{Cc}\p{Cf}"]/u.test(c))
    .join('')
    .trim()
    .slice(0, 200);
  return cleaned && cleaned !== '.' && cleaned !== '..' ? cleaned : 'document.pdf';
}

export function toFileRef(file: StoredFileEntity): FileRef {
  return { id: file.id, originalName: file.originalName, sizeBytes: file.sizeBytes, uploadedAt: file.uploadedAt };
}

/** Uploaded data sheets belong to products, which the whole group shares. `storage` may be a folder name: the local disk storage there. */
export function createFileService(data: SiteData, storage: FileStorage | string, clock: Clock = systemClock) {
  const store = typeof storage === 'string' ? new LocalDiskStorage(storage) : storage;

  return {
    /** Writes the bytes under a generated name and records them; call inside the caller's transaction. */
    async storePdf(tx: SiteData, upload: Upload | undefined, uploadedBy: number | null): Promise<StoredFileEntity> {
      if (!upload) throw new AppError('validation_failed', 'Choose a PDF file to upload', { file: 'Choose a PDF file' });
      if (!isPdf(upload.buffer)) throw new AppError('validation_failed', 'That file is not a PDF', { file: 'Only PDF files are accepted' });
      const storedName = `${randomUUID()}.pdf`;
      await store.put(storedName, upload.buffer, 'application/pdf');
      const file = tx.files.create({
        originalName: cleanOriginalName(upload.originalname),
        storedName,
        mimeType: 'application/pdf',
        sizeBytes: upload.size,
        uploadedBy,
        uploadedAt: clock.now().toISOString(),
      });
      return tx.files.save(file);
    },

    /** Deletes bytes no record points at any more. A failure only leaves an orphan behind, so it is logged, not thrown. */
    async discard(storedName: string, onError: (error: Error) => void = () => undefined): Promise<void> {
      await store.remove(storedName).catch(onError);
    },

    /** The record and its bytes, wherever they are stored. */
    async open(id: number): Promise<{ file: StoredFileEntity; content: StoredContent }> {
      const file = await data.files.findOneBy({ id });
      if (!file) throw notFound('File');
      const content = await store.open(file.storedName);
      if (!content) throw new AppError('not_found', 'The file is recorded but missing from the file storage');
      return { file, content };
    },
  };
}

export type FileService = ReturnType<typeof createFileService>;
