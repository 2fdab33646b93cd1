const CAUTIONS = [
  'Model estimates, not measurements. They do not replace personal air sampling under EN 689 or the local equivalent.',
  'Results hold only for the scenario as entered; re-assess after any change of process, material, controls or layout.',
  'Local regulations and a competent person (licensed where the law says so) decide on exposure compliance, ventilation design, commissioning and respiratory protection.',
  'Follow the hierarchy of controls: elimination, substitution, engineering controls, administrative controls, then respiratory protection.',
  'Combustible dust (explosion risk) is not assessed.',
];

export function Cautions({ compact = false }: { compact?: boolean }) {
  return (
    <aside
      aria-label="Cautions"
      className="mt-8 rounded-lg border border-line bg-paper-deep p-4 text-sm text-muted print:break-inside-avoid"
    >
      <h2 className="mb-2 font-semibold text-ink">
        <span aria-hidden="true">⚠ </span>Cautions
      </h2>
      <ul className={compact ? 'list-disc space-y-1 pl-5' : 'list-disc space-y-1.5 pl-5'}>
        {CAUTIONS.map((text) => (
          <li key={text}>{text}</li>
        ))}
      </ul>
    </aside>
  );
}
