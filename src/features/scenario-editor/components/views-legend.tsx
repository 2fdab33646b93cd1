// One legend for both drawings keeps the markers free of labels that would collide in a small room.
export function ViewsLegend() {
  return (
    <ul className="flex flex-wrap gap-x-6 gap-y-2 text-xs text-muted" aria-label="Legend">
      <li className="flex items-center gap-2">
        <svg width="14" height="14" aria-hidden="true">
          <path d="M7,1 L13,7 L7,13 L1,7 Z" className="fill-watch" />
        </svg>
        Source
      </li>
      <li className="flex items-center gap-2">
        <svg width="30" height="14" aria-hidden="true">
          <line x1="3" x2="3" y1="1" y2="13" className="stroke-accent-strong" strokeWidth="5" />
          <path d="M5,7 L26,7 M21,3 L26,7 L21,11" className="fill-none stroke-accent-strong" strokeWidth="2" />
        </svg>
        Hood face, arrow where it faces
      </li>
      <li className="flex items-center gap-2">
        <svg width="22" height="22" aria-hidden="true">
          <circle cx="11" cy="11" r="9" className="fill-ink/5 stroke-ink" strokeDasharray="3 2" />
          <circle cx="11" cy="11" r="3.5" className="fill-ink" />
        </svg>
        Worker&apos;s head and breathing zone
      </li>
      <li className="flex items-center gap-2">
        <svg width="16" height="16" aria-hidden="true">
          <circle cx="8" cy="8" r="6" className="fill-white stroke-accent-strong" strokeWidth="2" />
          <circle cx="8" cy="8" r="1.8" className="fill-accent-strong" />
        </svg>
        Hood facing you (a cross: facing away)
      </li>
    </ul>
  );
}
