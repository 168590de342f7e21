import { useQueryClient } from '@tanstack/react-query';
import { useId, useRef, useState, type KeyboardEvent } from 'react';
import { partQueryOptions } from '../../../api/parts/get-part';
import { partByTagQueryOptions } from '../../../api/parts/get-part-by-tag';
import { Button } from '../../../components/ui/button';
import { inputClasses } from '../../../components/ui/field';
import { isApiError } from '../../../lib/api-client';
import { errorMessage } from '../../../lib/error-messages';
import { fromPart, readScannedCode, type PickedPart } from '../utils/picked-part';
import { canScanTags, TagScanner } from './tag-scanner';

/** A part found by scanning its rack tag's QR code or typing the code printed under it. */
export function TagEntry({ onFound }: { onFound: (part: PickedPart) => void }) {
  const queryClient = useQueryClient();
  const id = useId();
  const [text, setText] = useState('');
  const [message, setMessage] = useState<{ text: string; bad: boolean } | null>(null);
  const [scanning, setScanning] = useState(false);
  const [pending, setPending] = useState(false);
  // The camera sees the same code several times a second; one look-up at a time.
  const busy = useRef(false);

  const look = async (raw: string) => {
    const code = readScannedCode(raw);
    if (!code) return setMessage({ text: 'That is not a Boothwright tag. Type the eight-character code printed under the QR code.', bad: true });
    if (busy.current) return;
    busy.current = true;
    setPending(true);
    try {
      const part = 'partId' in code ? await queryClient.fetchQuery(partQueryOptions(code.partId)) : await queryClient.fetchQuery(partByTagQueryOptions(code.tag));
      onFound(fromPart(part));
      setText('');
      setScanning(false);
      setMessage({ text: `${part.label} (tag ${part.tag}) is added.`, bad: false });
    } catch (error) {
      const missing = isApiError(error) && error.status === 404;
      setMessage({ text: missing ? `No part has the tag ${'tag' in code ? code.tag : raw}. Check the code and try again.` : errorMessage(error), bad: true });
    } finally {
      busy.current = false;
      setPending(false);
    }
  };

  // Not a <form>: this sits inside the coat form, and a nested form would submit the coat instead.
  const onEnter = (event: KeyboardEvent<HTMLInputElement>) => {
    if (event.key !== 'Enter') return;
    event.preventDefault();
    void look(text);
  };

  return (
    <div className="space-y-3">
      <div role="group" aria-label="Add a part by its tag">
        <label htmlFor={id} className="mb-1 block font-medium">
          Tag code
        </label>
        <div className="flex gap-2">
          <input
            id={id}
            className={`${inputClasses} min-h-14 min-w-0 flex-1 font-mono text-xl uppercase tracking-wider`}
            autoComplete="off"
            autoCapitalize="characters"
            spellCheck={false}
            value={text}
            aria-describedby={`${id}-message`}
            onChange={(event) => setText(event.target.value)}
            onKeyDown={onEnter}
          />
          <Button className="min-h-14 shrink-0" pending={pending} pendingText="Finding…" onClick={() => void look(text)}>
            Add part
          </Button>
        </div>
      </div>
      <p id={`${id}-message`} role="status" className={message?.bad ? 'font-medium text-verdict-stop' : 'text-maple-700'}>
        {message?.text ?? 'Eight letters and digits, printed under the QR code on the rack tag.'}
      </p>
      {canScanTags() &&
        (scanning ? (
          <TagScanner onCode={(raw) => void look(raw)} onClose={() => setScanning(false)} />
        ) : (
          <Button variant="secondary" className="min-h-14" onClick={() => setScanning(true)}>
            Scan a tag with the camera
          </Button>
        ))}
    </div>
  );
}
