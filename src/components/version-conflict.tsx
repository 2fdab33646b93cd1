import { ConflictChoices } from '@/components/conflict-choices';
import { sig } from '@/lib/format';
import { recordDiff } from '@/lib/record-diff';

type Props = {
  what: string;
  mine: unknown;
  saved: { version: number };
  savedFields: unknown;
  labels?: Record<string, string>;
  onKeepMine: () => void;
  onTakeSaved: () => void;
};

function shown(v: unknown): string {
  if (v === null || v === undefined || v === '') return '—';
  if (typeof v === 'number') return sig(v, 4);
  if (typeof v === 'string') return `“${v}”`;
  if (typeof v === 'boolean') return v ? 'yes' : 'no';
  return Object.entries(v as Record<string, unknown>)
    .map(([k, x]) => `${k} ${shown(x)}`)
    .join(', ');
}

// On a narrow screen the two versions scroll sideways inside the panel and the field they belong to stays in view.
const FIELD = 'sticky left-0 bg-watch-soft max-sm:shadow-[1px_0_0_var(--color-line)]';

// Someone saved first: both versions stay on screen, nothing typed is lost, and the person decides which wins.
export function VersionConflict({ what, mine, saved, savedFields, labels = {}, onKeepMine, onTakeSaved }: Props) {
  const rows = recordDiff(mine, savedFields);
  return (
    <section role="alert" aria-label="Edit conflict" className="rounded-lg border-2 border-watch bg-watch-soft p-4 text-sm">
      <h3 className="font-semibold text-watch">Someone else saved this {what} while you were editing</h3>
      <p className="mt-1">
        Nothing of yours was saved. The stored copy is now version {saved.version}; your changes are still in the form.
      </p>
      {rows.length ? (
        <div className="mt-2 overflow-x-auto">
          <table className="w-full text-left text-xs">
            <thead>
              <tr>
                <th className={`pr-3 ${FIELD}`}>Field</th>
                <th className="pr-3 max-sm:min-w-32">Yours</th>
                <th className="max-sm:min-w-32">Stored now</th>
              </tr>
            </thead>
            <tbody>
              {rows.map((r) => (
                <tr key={r.path}>
                  <td className={`pr-3 font-semibold ${FIELD}`}>{labels[r.path] ?? r.path}</td>
                  <td className="pr-3">{shown(r.mine)}</td>
                  <td>{shown(r.saved)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : (
        <p className="mt-2">Your fields and the stored ones are the same.</p>
      )}
      <ConflictChoices version={saved.version} savedWord="stored" onKeepMine={onKeepMine} onTakeSaved={onTakeSaved} />
    </section>
  );
}
