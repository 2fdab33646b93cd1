import { fieldLabel, isShownAtField } from '@/features/scenario-editor/lib/field-labels';

// Every issue is shown at its field; the ones with no field of their own are listed here so none is lost.
export function ValidationSummary({ errors }: { errors: Record<string, string> }) {
  const paths = Object.keys(errors);
  if (paths.length === 0) {
    return (
      <p role="status" className="flex items-center gap-2 text-sm text-clear" data-testid="validation-summary">
        <span aria-hidden="true">✓</span> Ready to run: every field checks out.
      </p>
    );
  }
  const elsewhere = paths.filter((p) => !isShownAtField(p));
  return (
    <div role="status" className="rounded-md border border-watch bg-watch-soft p-3 text-sm text-watch" data-testid="validation-summary">
      <p className="font-semibold">
        <span aria-hidden="true">⚠ </span>
        {paths.length === 1 ? 'One field needs' : `${paths.length} fields need`} attention before a run.
      </p>
      {elsewhere.length > 0 && (
        <ul className="mt-1 list-disc pl-5">
          {elsewhere.map((p) => (
            <li key={p}>
              {fieldLabel(p)}: {errors[p]}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
