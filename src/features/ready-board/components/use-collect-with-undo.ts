import { toast } from 'sonner';
import { errorMessage } from '../../../lib/error-messages';
import { useCollectPart } from '../../../api/parts/collect-part';
import { useUncollectPart } from '../../../api/parts/collect-part';
import type { BoardPart } from './readiness';

/**
 * "Collected" with Undo in the toast. Held by the page, not the part's card, because with the
 * usual filter the card disappears as soon as the part is collected, and Undo must still work.
 */
export function useCollectWithUndo() {
  const collect = useCollectPart();
  const uncollect = useUncollectPart();

  const undo = async (part: BoardPart) => {
    try {
      await uncollect.mutateAsync(part.id);
      // The server puts the part back on the rack and shelf it was taken from, if that rack still exists.
      toast.success(`${part.label} is back on the board as not collected.`, {
        description: part.rack ? `It is recorded on ${part.rack.name}${part.rack.shelf != null ? `, shelf ${part.rack.shelf}` : ''} again.` : undefined,
      });
    } catch (error) {
      toast.error(`Could not undo: ${errorMessage(error)}`);
    }
  };

  const markCollected = async (part: BoardPart) => {
    try {
      await collect.mutateAsync(part.id);
      toast.success(`${part.label} (${part.jobReference}) marked collected.`, {
        description: part.rack ? `Its place on ${part.rack.name} is free again.` : undefined,
        action: { label: 'Undo', onClick: () => void undo(part) },
        duration: 10_000,
      });
    } catch (error) {
      toast.error(`Could not mark ${part.label} collected: ${errorMessage(error)}`);
    }
  };

  const pendingId = collect.isPending ? collect.variables : null;
  return { markCollected, pendingId };
}
