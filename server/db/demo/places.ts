// Invented demo places and agents: the names are made up, the limits are published ones with their sources.
export const DEMO_SITES = [
  {
    key: 'stone',
    site: { name: 'Harrowgate Stoneworks', data: { address: 'Unit 4, Quarry Road (invented)', notes: 'Engineered-stone worktops.' } },
    room: 'Fabrication hall',
    workstation: {
      name: 'Edge-grinding bench 2',
      description: 'Hand-held angle grinder on countertop edges, dry.',
      releaseType: 'high' as const,
    },
    agent: 'silica',
    files: ['stone-bench-no-control', 'stone-bench-slot-hood', 'stone-bench-flanged-hood'],
  },
  {
    key: 'bakery',
    site: { name: 'Kestrel Lane Bakery', data: { address: '12 Kestrel Lane (invented)', notes: 'Bread and rolls, two mixers.' } },
    room: 'Mixing room',
    workstation: {
      name: 'Sack tipping at mixer 1',
      description: '25 kg flour sacks tipped into the mixer bowl.',
      releaseType: 'active' as const,
    },
    agent: 'flour',
    files: ['bakery-tipping-no-control', 'bakery-tipping-slot-hood', 'bakery-tipping-flanged-hood'],
  },
  {
    key: 'joinery',
    site: { name: 'Oakwell Joinery', data: { address: 'Mill Yard, Oakwell (invented)', notes: 'Hardwood furniture finishing.' } },
    room: 'Finishing shop',
    workstation: { name: 'Sanding bench', description: 'Random-orbital sander on oak panels.', releaseType: 'active' as const },
    agent: 'hardwood',
    files: ['joinery-sander-no-control', 'joinery-sander-side-hood', 'joinery-sander-downdraft-bench'],
  },
] as const;

export const DEMO_AGENTS = {
  silica: {
    name: 'Respirable crystalline silica',
    data: {
      density_kgPerM3: 2650,
      shapeFactor: 1.36,
      limitFraction: 'respirable' as const,
      limit8h_mgPerM3: 0.025,
      limit15min_mgPerM3: null,
      jurisdiction: 'ACGIH TLV (advisory, US)',
      limitSource:
        'ACGIH TLV-TWA for alpha-quartz and cristobalite; OSHA PEL 0.05 mg/m³ (29 CFR 1910.1053), EU binding OEL 0.1 mg/m³ (Directive (EU) 2017/2398)',
      limitDate: '2024',
      override: null,
      notes: 'Check the limit in force where the work is done.',
    },
  },
  flour: {
    name: 'Flour dust',
    data: {
      density_kgPerM3: 1450,
      shapeFactor: 1.1,
      limitFraction: 'inhalable' as const,
      limit8h_mgPerM3: 1,
      limit15min_mgPerM3: null,
      jurisdiction: 'EU scientific recommendation',
      limitSource:
        '1 mg/m³ inhalable, from memory; limits differ widely (e.g. ACGIH 0.5 mg/m³ inhalable, UK WEL 10 mg/m³): check before use',
      limitDate: '',
      override: null,
      notes: 'Flour is a respiratory sensitiser: keep exposure as low as reasonably practicable.',
    },
  },
  hardwood: {
    name: 'Hardwood dust',
    data: {
      density_kgPerM3: 1400,
      shapeFactor: 1.4,
      limitFraction: 'inhalable' as const,
      limit8h_mgPerM3: 2,
      limit15min_mgPerM3: null,
      jurisdiction: 'EU binding OEL',
      limitSource: 'Directive (EU) 2017/2398, 2 mg/m³ inhalable from 2023 (from memory: check the current text)',
      limitDate: '2023-01-17',
      override: null,
      notes: 'Hardwood dust is a carcinogen (nasal cancer).',
    },
  },
};
