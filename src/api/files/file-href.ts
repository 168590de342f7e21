import type { FileRef } from '../../../shared/schemas/product';

/** The download address of an uploaded data sheet; the server sends the file back under its original name. */
export const fileHref = (file: FileRef) => `/api/files/${file.id}`;
