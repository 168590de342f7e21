import { Button } from '../../../components/ui/button';

/** Cancel and save at the foot of every upkeep form, tall enough for gloved hands. */
export function FormActions({ onCancel, pending, saveText }: { onCancel: () => void; pending: boolean; saveText: string }) {
  return (
    <div className="mt-6 flex flex-wrap justify-end gap-3">
      <Button variant="secondary" onClick={onCancel}>
        Cancel
      </Button>
      <Button type="submit" pending={pending} pendingText="Saving…">
        {saveText}
      </Button>
    </div>
  );
}
