import type { ReactNode } from 'react';

function Entry({ label, width, height, children }: { label: string; width: number; height: number; children: ReactNode }) {
  return (
    <li className="flex items-center gap-2">
      <svg width={width} height={height} aria-hidden="true">
        {children}
      </svg>
      {label}
    </li>
  );
}

// One legend for both drawings keeps the markers free of labels that would collide in a small room.
export function ViewsLegend() {
  return (
    <ul className="flex flex-wrap gap-x-6 gap-y-2 text-xs text-muted" aria-label="Legend">
      <Entry label="Source" width={14} height={14}>
        <path d="M7,1 L13,7 L7,13 L1,7 Z" className="fill-watch" />
      </Entry>
      <Entry label="Hood face, arrow where it faces" width={30} height={14}>
        <line x1="3" x2="3" y1="1" y2="13" className="stroke-accent-strong" strokeWidth="5" />
        <path d="M5,7 L26,7 M21,3 L26,7 L21,11" className="fill-none stroke-accent-strong" strokeWidth="2" />
      </Entry>
      <Entry label="Worker's head and breathing zone" width={22} height={22}>
        <circle cx="11" cy="11" r="9" className="fill-ink/5 stroke-ink" strokeDasharray="3 2" />
        <circle cx="11" cy="11" r="3.5" className="fill-ink" />
      </Entry>
      <Entry label="Hood facing you (a cross: facing away)" width={16} height={16}>
        <circle cx="8" cy="8" r="6" className="fill-white stroke-accent-strong" strokeWidth="2" />
        <circle cx="8" cy="8" r="1.8" className="fill-accent-strong" />
      </Entry>
    </ul>
  );
}
