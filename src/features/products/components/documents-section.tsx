import { useRef, useState, type FormEvent } from 'react';
import { toast } from 'sonner';
import type { Product } from '../../../../shared/schemas/product';
import { Button } from '../../../components/ui/button';
import { FieldShell, inputClasses } from '../../../components/ui/field';
import { isApiError } from '../../../lib/api-client';
import { errorMessage } from '../../../lib/error-messages';
import { formatShopDateTime } from '../../../lib/shop-time';
import { useUploadDocument, type DocumentKind } from '../../../api/products/upload-document';
import { fileHref } from '../../../api/files/file-href';
import { documentTitles, fileSizeWords } from './product-format';

// The server's own limit (20 MB); checked here too so a large file is not sent only to be refused.
const maxBytes = 20 * 1024 * 1024;

interface DocumentProps {
  product: Product;
  kind: DocumentKind;
  canWrite: boolean;
  timeZone: string;
}

function uploadErrorWords(error: unknown): string {
  if (isApiError(error) && error.fields.file) return `${error.message}: ${error.fields.file}.`;
  return errorMessage(error);
}

function UploadForm({ product, kind }: { product: Product; kind: DocumentKind }) {
  const upload = useUploadDocument();
  const input = useRef<HTMLInputElement>(null);
  const [error, setError] = useState<string | undefined>();
  const title = documentTitles[kind];
  const existing = kind === 'tds' ? product.tdsFile : product.sdsFile;

  const onSubmit = async (event: FormEvent) => {
    event.preventDefault();
    const file = input.current?.files?.[0];
    if (!file) return setError('Choose a PDF file first.');
    if (file.size > maxBytes) return setError('That file is larger than 20 MB.');
    setError(undefined);
    try {
      await upload.mutateAsync({ productId: product.id, kind, file });
      toast.success(`The ${title.long} is attached.`);
      if (input.current) input.current.value = '';
    } catch (caught) {
      setError(uploadErrorWords(caught));
    }
  };

  return (
    <form onSubmit={onSubmit} noValidate aria-label={`Upload the ${title.long}`} className="mt-2 space-y-2">
      <FieldShell label={`${existing ? 'Replace' : 'Attach'} the ${title.short} (PDF, up to 20 MB)`} error={error}>
        {(control) => <input {...control} ref={input} type="file" accept="application/pdf,.pdf" className={`${inputClasses} py-1.5`} />}
      </FieldShell>
      <Button type="submit" variant="secondary" pending={upload.isPending} pendingText="Uploading…">
        Upload {title.short}
      </Button>
    </form>
  );
}

function DocumentBlock({ product, kind, canWrite, timeZone }: DocumentProps) {
  const file = kind === 'tds' ? product.tdsFile : product.sdsFile;
  const title = documentTitles[kind];
  return (
    <div className="border-b border-maple-200 py-3 last:border-b-0">
      <h3 className="font-semibold first-letter:uppercase">{title.long}</h3>
      {file ? (
        <p>
          <a href={fileHref(file)} download className="font-semibold text-lacquer-800 underline underline-offset-2">
            Download {file.originalName}
          </a>{' '}
          <span className="text-sm text-maple-700">
            ({fileSizeWords(file.sizeBytes)}, added {formatShopDateTime(file.uploadedAt, timeZone)})
          </span>
        </p>
      ) : (
        <p className="text-maple-700">None attached.</p>
      )}
      {canWrite && <UploadForm product={product} kind={kind} />}
    </div>
  );
}

export function DocumentsSection({ product, canWrite, timeZone }: { product: Product; canWrite: boolean; timeZone: string }) {
  return (
    <section aria-labelledby="documents-heading" className="rounded-panel border border-maple-300 bg-white p-4">
      <h2 id="documents-heading" className="text-lg font-semibold">
        Documents
      </h2>
      <DocumentBlock product={product} kind="tds" canWrite={canWrite} timeZone={timeZone} />
      <DocumentBlock product={product} kind="sds" canWrite={canWrite} timeZone={timeZone} />
    </section>
  );
}
