import { useQueryClient } from '@tanstack/react-query';
import { useId, useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import { Button } from '../../../components/ui/button';
import { inputClasses } from '../../../components/ui/field';
import { isApiError } from '../../../lib/api-client';
import { errorMessage } from '../../../lib/error-messages';
import { normaliseTag } from '../../../api/parts/normalise-tag';
import { partByTagQueryOptions } from '../../../api/parts/get-part-by-tag';

/** For when a camera cannot read a tag: type the code printed under it and go to the part. */
export function FindTagForm() {
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  const id = useId();
  const [text, setText] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const [pending, setPending] = useState(false);

  const find = async (event: FormEvent) => {
    event.preventDefault();
    const tag = normaliseTag(text);
    if (!tag) return setProblem('Type the code printed on the tag.');
    setProblem(null);
    setPending(true);
    try {
      const part = await queryClient.fetchQuery(partByTagQueryOptions(tag));
      navigate(`/parts/${part.id}`);
    } catch (error) {
      setProblem(isApiError(error) && error.status === 404 ? `No part has the tag ${tag}. Check the code on the tag and try again.` : errorMessage(error));
    } finally {
      setPending(false);
    }
  };

  return (
    <form role="search" aria-label="Tag finder" onSubmit={find} className="border-t border-maple-300 pt-4 xl:border-t-0 xl:border-l xl:pt-0 xl:pl-8" noValidate>
      <label htmlFor={id} className="mb-1 block font-medium">
        Find a tag
      </label>
      <div className="flex gap-3">
        <input
          id={id}
          className={`${inputClasses} min-w-0 flex-1 font-mono uppercase tracking-wider placeholder:font-sans placeholder:normal-case placeholder:tracking-normal`}
          placeholder="e.g. K7M2 Q9XP"
          autoComplete="off"
          autoCapitalize="characters"
          spellCheck={false}
          value={text}
          aria-invalid={Boolean(problem)}
          aria-describedby={`${id}-hint`}
          onChange={(event) => setText(event.target.value)}
        />
        <Button type="submit" variant="secondary" className="shrink-0" pending={pending} pendingText="Finding…">
          Find part
        </Button>
      </div>
      <p id={`${id}-hint`} className={`mt-1 text-sm ${problem ? 'font-medium text-verdict-stop' : 'text-maple-700'}`}>
        {problem ? <><span aria-hidden="true">⚠ </span>{problem}</> : 'Eight letters and digits, printed under the QR code on a rack tag.'}
      </p>
    </form>
  );
}
