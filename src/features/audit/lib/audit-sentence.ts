import { countText, dateText, trimSig } from '../../../../shared/format/index';
import { ROLE_LABELS, type Role } from '../../../../shared/auth/permissions';
import type { AuditChange, AuditEntry } from '../../../../shared/schemas/workspace-views';

const THING: Record<string, string> = {
  person: 'person',
  site: 'site',
  room: 'room',
  workstation: 'workstation',
  agent: 'dust agent',
  size_profile: 'size profile',
  scenario: 'scenario',
  run: 'run',
};

// The plain verb of the common "<thing>.<verb>" actions; anything else reads from its code.
const VERB: Record<string, string> = {
  created: 'created',
  changed: 'changed',
  renamed: 'renamed',
  deleted: 'deleted',
  restored: 'restored',
};

/** Words for each recorded action, for the filter and the export. */
export const ACTION_LABEL: Record<string, string> = {
  'auth.signed_in': 'Signed in',
  'auth.signed_out': 'Signed out',
  'auth.sign_in_failed': 'Failed sign-in',
  'person.invited': 'Person invited',
  'person.role_changed': 'Role changed',
  'person.deactivated': 'Person deactivated',
  'person.reactivated': 'Person reactivated',
  'person.password_link_sent': 'Password link sent',
  'person.password_set': 'Password set',
  'site.created': 'Site created',
  'room.created': 'Room created',
  'workstation.created': 'Workstation created',
  'workstation.changed': 'Workstation changed',
  'workstation.operators_assigned': 'Operators assigned',
  'agent.created': 'Dust agent created',
  'agent.changed': 'Dust agent changed',
  'agent.limit_overridden': 'Limit overridden',
  'size_profile.created': 'Size profile created',
  'size_profile.deleted': 'Size profile deleted',
  'scenario.created': 'Scenario created',
  'scenario.changed': 'Scenario changed',
  'scenario.deleted': 'Scenario deleted',
  'run.saved': 'Run saved',
  'scenario.approved': 'Scenario approved',
  'report.shared': 'Report shared',
};

const words = (code: string) => code.replace(/_/g, ' ').replace(/([a-z])([A-Z])/g, (_, a: string, b: string) => `${a} ${b.toLowerCase()}`);
export const actionLabel = (action: string) => ACTION_LABEL[action] ?? words(action.replace('.', ': '));

const UNIT: Record<string, string> = {
  m: 'm',
  mm: 'mm',
  um: 'µm',
  m2: 'm²',
  m3: 'm³',
  mPerS: 'm/s',
  m2PerS: 'm²/s',
  m3PerS: 'm³/s',
  m3PerH: 'm³/h',
  mgPerM3: 'mg/m³',
  mgPerMin: 'mg/min',
  mg: 'mg',
  kgPerM3: 'kg/m³',
  s: 's',
  min: 'min',
  h: 'h',
  perH: 'per hour',
  C: '°C',
  K: 'K',
  deg: '°',
  pct: '%',
};

/** "hoods.1.airflow_m3PerS" reads "hood 1 airflow", with its unit "m³/s". */
export function fieldWords(field: string): { label: string; unit?: string } {
  // A scenario's inputs sit under "input"; the reader knows the scenario is what changed.
  const parts = field.replace(/^input\./, '').split('.');
  const leaf = parts[parts.length - 1];
  const cut = leaf.indexOf('_');
  const unit = cut > 0 ? UNIT[leaf.slice(cut + 1)] : undefined;
  const named = parts.map((p, i) => {
    if (i === parts.length - 1 && cut > 0) return words(leaf.slice(0, cut));
    // A list's name before an item number reads in the singular: "hoods.1" is "hood 1".
    if (/^\d+$/.test(parts[i + 1] ?? '') && p.endsWith('s')) return words(p.slice(0, -1));
    return words(p);
  });
  return { label: named.join(' ').toLowerCase(), unit };
}

export function valueWords(value: unknown, unit?: string): string {
  if (value === null || value === undefined || value === '') return 'nothing';
  if (typeof value === 'number') return `${trimSig(value, 4)}${unit ? (unit === '%' || unit.startsWith('°') ? unit : ` ${unit}`) : ''}`;
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  return `“${String(value)}”`;
}

export function changeWords(c: AuditChange): string {
  const { label, unit } = fieldWords(c.field);
  return `${label} from ${valueWords(c.from, unit)} to ${valueWords(c.to, unit)}`;
}

function thing(e: AuditEntry): string {
  if (!e.targetType) return '';
  const kind = THING[e.targetType] ?? words(e.targetType);
  if (e.targetType === 'person') return e.targetName ?? `person ${e.targetId}`;
  // The entry names the record as it was then; a later rename is said beside it.
  const then = typeof e.detail?.name === 'string' ? e.detail.name : null;
  const name = then ?? e.targetName;
  if (!name) return `${kind} ${e.targetId ?? ''}`.trim();
  return `the ${kind} “${name}”${e.targetName && then && e.targetName !== then ? ` (now “${e.targetName}”)` : ''}`;
}

const role = (r: unknown) => ROLE_LABELS[r as Role] ?? String(r);
const listOf = (names: string[]) => (names.length < 2 ? names.join('') : `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`);

/** Who acted: a name, an address only where the server gave one (admins), else a plain "Someone". */
export function actorWords(e: AuditEntry): string {
  return e.actorName ?? e.actorEmail ?? 'Someone';
}

// What happened, after the actor's name: "changed the scenario “Flanged hood”".
export function deedWords(e: AuditEntry): string {
  const d = e.detail ?? {};
  const target = thing(e);
  switch (e.action) {
    case 'auth.signed_in':
      return 'signed in';
    case 'auth.signed_out':
      return 'signed out';
    case 'auth.sign_in_failed':
      return e.actorName ? 'typed a wrong password when signing in' : 'tried to sign in with an address Motewalk does not know';
    case 'person.invited':
      return `invited ${target} as ${role(d.role)}`;
    case 'person.role_changed':
      return `changed the role of ${target} from ${role(d.from)} to ${role(d.to)}`;
    case 'person.password_link_sent':
      return `sent ${target} a link to set a password`;
    case 'person.password_set':
      return 'set their password';
    case 'workstation.operators_assigned': {
      const names = (Array.isArray(d.personNames) ? d.personNames : []).map((n) => String(n ?? 'someone no longer listed'));
      return names.length ? `made ${listOf(names)} the operators of ${target}` : `removed every operator from ${target}`;
    }
    case 'agent.limit_overridden': {
      const n = Array.isArray(d.scenariosRejudged) ? d.scenariosRejudged.length : 0;
      return `overrode the limit of ${target}${n ? `, re-judging ${countText(n)} scenario${n === 1 ? '' : 's'}` : ''}`;
    }
    case 'run.saved':
      return `saved a run of ${target}${typeof d.particles === 'number' ? ` (${countText(d.particles)} particles, seed ${String(d.seed)})` : ''}`;
    case 'scenario.approved':
      return `approved ${target} as the station’s control${typeof d.reviewDate === 'string' ? `, to be reviewed by ${dateText(d.reviewDate)}` : ''}`;
    case 'report.shared': {
      const to = typeof d.toName === 'string' ? d.toName : typeof d.to === 'string' ? d.to : 'someone outside Motewalk';
      return `shared the report of ${target} with ${to}`;
    }
  }
  const [, verb = ''] = e.action.split('.');
  if (e.targetType === 'person' && (verb === 'deactivated' || verb === 'reactivated')) return `${verb} ${target}`;
  const said = VERB[verb] ?? words(verb);
  return target ? `${said} ${target}` : said;
}

export function changesOf(e: AuditEntry): string[] {
  const list = e.detail?.changes;
  return Array.isArray(list) ? (list as AuditChange[]).map(changeWords) : [];
}

/** The whole entry as one sentence, for the export and for screen readers. */
export function auditSentence(e: AuditEntry): string {
  const changes = changesOf(e);
  return `${actorWords(e)} ${deedWords(e)}${changes.length ? `: ${changes.join('; ')}` : ''}.`;
}
