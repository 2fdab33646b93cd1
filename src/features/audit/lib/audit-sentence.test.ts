import { describe, expect, it } from 'vitest';
import type { AuditEntry } from '../../../../shared/schemas/workspace-views';
import { actionLabel, auditSentence, fieldWords, valueWords } from './audit-sentence';

const entry = (over: Partial<AuditEntry>): AuditEntry => ({
  id: 1,
  actorName: 'Tomas Okafor',
  actorEmail: null,
  action: 'scenario.changed',
  targetType: 'scenario',
  targetId: '7',
  targetName: 'Flanged hood',
  detail: null,
  createdAt: '2026-12-02T14:05:00Z',
  ...over,
});

describe('auditSentence', () => {
  it('says who did what to which named thing, and what changed from and to', () => {
    const e = entry({
      detail: {
        version: 4,
        changes: [
          { field: 'name', from: 'Slot hood', to: 'Flanged hood' },
          { field: 'hoods.1.airflow_m3PerS', from: 0.5, to: 0.625 },
        ],
      },
    });
    expect(auditSentence(e)).toBe(
      'Tomas Okafor changed the scenario “Flanged hood”: name from “Slot hood” to “Flanged hood”; hood 1 airflow from 0.5 m³/s to 0.625 m³/s.',
    );
  });

  it('names people rather than their addresses, and a stranger as someone', () => {
    expect(
      auditSentence(entry({ action: 'person.invited', targetType: 'person', targetName: 'Noor Hassan', detail: { role: 'viewer' } })),
    ).toBe('Tomas Okafor invited Noor Hassan as Viewer.');
    expect(auditSentence(entry({ actorName: null, action: 'auth.sign_in_failed', targetType: null, targetName: null }))).toBe(
      'Someone tried to sign in with an address Motewalk does not know.',
    );
  });

  it('uses the address only where the server gave one', () => {
    const e = entry({ actorName: null, actorEmail: 'nobody@elsewhere.example', action: 'auth.sign_in_failed', targetType: null });
    expect(auditSentence(e)).toBe('nobody@elsewhere.example tried to sign in with an address Motewalk does not know.');
  });

  it('tells role changes, runs, approvals and shares in words', () => {
    expect(
      auditSentence(
        entry({
          action: 'person.role_changed',
          targetType: 'person',
          targetName: 'Maren Holt',
          detail: { from: 'viewer', to: 'engineer' },
        }),
      ),
    ).toBe('Tomas Okafor changed the role of Maren Holt from Viewer to Engineer.');
    expect(auditSentence(entry({ action: 'run.saved', detail: { runId: 3, particles: 40000, seed: '20240601' } }))).toBe(
      'Tomas Okafor saved a run of the scenario “Flanged hood” (40,000 particles, seed 20240601).',
    );
    expect(auditSentence(entry({ action: 'scenario.approved', detail: { reviewDate: '2027-06-02' } }))).toMatch(
      /^Tomas Okafor approved the scenario “Flanged hood” as the station’s control, to be reviewed by .*2027\.$/,
    );
    expect(auditSentence(entry({ action: 'report.shared', detail: { toName: null } }))).toBe(
      'Tomas Okafor shared the report of the scenario “Flanged hood” with someone outside Motewalk.',
    );
  });

  it('reads an action it has no words for from its code, and a record without a name by its number', () => {
    expect(auditSentence(entry({ action: 'room.deleted', targetType: 'room', targetId: '5', targetName: null }))).toBe(
      'Tomas Okafor deleted room 5.',
    );
    expect(actionLabel('run.replay_mismatch')).toBe('run: replay mismatch');
  });
});

describe('names as they were', () => {
  it('names the record as the entry recorded it, and says what it is called now', () => {
    expect(auditSentence(entry({ action: 'scenario.created', targetName: 'Slot hood (more air)', detail: { name: 'Slot hood' } }))).toBe(
      'Tomas Okafor created the scenario “Slot hood” (now “Slot hood (more air)”).',
    );
  });
});

describe('fieldWords and valueWords', () => {
  it('turn a stored field path into words with its unit', () => {
    expect(fieldWords('source.rate_mgPerMin')).toEqual({ label: 'source rate', unit: 'mg/min' });
    expect(fieldWords('input.hoods.2.faceWidth_m')).toEqual({ label: 'hood 2 face width', unit: 'm' });
    expect(fieldWords('controlDescription')).toEqual({ label: 'control description', unit: undefined });
    expect(fieldWords('room.temperature_C')).toEqual({ label: 'room temperature', unit: '°C' });
  });
  it('write numbers to four significant figures and empty values as nothing', () => {
    expect(valueWords(0.30000000000000004, 'm')).toBe('0.3 m');
    expect(valueWords(21.5, '°C')).toBe('21.5°C');
    expect(valueWords(null)).toBe('nothing');
    expect(valueWords(true)).toBe('yes');
  });
});
