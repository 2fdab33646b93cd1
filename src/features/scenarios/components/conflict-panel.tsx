import { ConflictChoices } from '@/components/conflict-choices';

type Side = { version: number; name: string; input: unknown };

function diffLines(mine: unknown, theirs: unknown, path = ''): string[] {
  if (JSON.stringify(mine) === JSON.stringify(theirs)) return [];
  if (mine && theirs && typeof mine === 'object' && typeof theirs === 'object' && !Array.isArray(mine)) {
    const keys = new Set([...Object.keys(mine), ...Object.keys(theirs as object)]);
    return [...keys].flatMap((k) =>
      diffLines((mine as Record<string, unknown>)[k], (theirs as Record<string, unknown>)[k], path ? `${path}.${k}` : k),
    );
  }
  return [`${path}: yours ${JSON.stringify(mine)} · saved ${JSON.stringify(theirs)}`];
}

// Both versions stay on screen, so nothing typed is lost while the engineer decides.
export function ConflictPanel({
  mine,
  theirs,
  onKeepMine,
  onTakeTheirs,
}: {
  mine: Side;
  theirs: Side;
  onKeepMine: () => void;
  onTakeTheirs: () => void;
}) {
  const lines = [
    ...(mine.name !== theirs.name ? [`name: yours "${mine.name}" · saved "${theirs.name}"`] : []),
    ...diffLines(mine.input, theirs.input),
  ];
  return (
    <section role="alert" aria-label="Edit conflict" className="rounded-lg border-2 border-watch bg-watch-soft p-4 text-sm">
      <h2 className="text-watch">Someone else saved this scenario while you were editing</h2>
      <p className="mt-1">The saved copy is version {theirs.version}. Your changes are still here. Differences:</p>
      <ul className="mt-2 max-h-48 list-disc overflow-auto pl-5 font-mono text-xs max-sm:[overflow-wrap:anywhere]">
        {lines.length ? lines.map((l) => <li key={l}>{l}</li>) : <li>No difference in the inputs.</li>}
      </ul>
      <ConflictChoices version={theirs.version} savedWord="saved" onKeepMine={onKeepMine} onTakeSaved={onTakeTheirs} />
    </section>
  );
}
