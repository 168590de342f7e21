import { useEffect, useId, useRef, type ReactNode } from 'react';

interface DialogProps {
  open: boolean;
  onClose: () => void;
  title: string;
  description?: string;
  children: ReactNode;
  wide?: boolean;
}

/**
 * A modal built on the native <dialog>: the browser traps focus, makes the page behind inert
 * and closes on Escape. Children mount only while open, so forms start fresh each time.
 */
export function Dialog({ open, onClose, title, description, children, wide = false }: DialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  const descriptionId = useId();

  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) dialog.showModal();
    if (!open && dialog.open) dialog.close();
  }, [open]);

  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      aria-describedby={description ? descriptionId : undefined}
      onClose={onClose}
      className={`m-auto max-h-[92dvh] w-[calc(100%-1rem)] overflow-y-auto rounded-panel border border-maple-300 bg-maple-50 p-0 text-maple-900 shadow-2xl backdrop:bg-maple-900/50 ${wide ? 'max-w-3xl' : 'max-w-lg'}`}
    >
      {open && (
        <div className="p-4 sm:p-6">
          <div className="mb-4 flex items-start justify-between gap-4">
            <div>
              <h2 id={titleId} className="text-xl font-semibold text-lacquer-900">
                {title}
              </h2>
              {description && (
                <p id={descriptionId} className="mt-1 text-maple-700">
                  {description}
                </p>
              )}
            </div>
            <button
              type="button"
              onClick={onClose}
              className="min-h-touch min-w-touch rounded-panel px-3 font-semibold text-maple-700 hover:bg-maple-200"
            >
              Close
            </button>
          </div>
          {children}
        </div>
      )}
    </dialog>
  );
}
