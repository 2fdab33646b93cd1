import { Button } from '@/components/ui/button';

/** The two ways out of an edit conflict: write mine over the saved version, or drop mine and load it. */
export function ConflictChoices({
  version,
  savedWord,
  onKeepMine,
  onTakeSaved,
}: {
  version: number;
  /** How the panel names the other copy ("stored" for records, "saved" for scenarios). */
  savedWord: 'stored' | 'saved';
  onKeepMine: () => void;
  onTakeSaved: () => void;
}) {
  return (
    <div className="mt-3 flex flex-wrap gap-2">
      <Button onClick={onKeepMine}>Save mine over version {version}</Button>
      <Button variant="secondary" onClick={onTakeSaved}>
        Discard mine and load the {savedWord} one
      </Button>
    </div>
  );
}
