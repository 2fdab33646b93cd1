import type { ScenarioInput } from '../../../../shared/schemas/scenario';

type S = ScenarioInput;

// Each section edits one branch of the scenario; these keep the spreads in one place.
export const withRoom = (s: S, patch: Partial<S['room']>): S => ({ ...s, room: { ...s.room, ...patch } });
export const withSource = (s: S, patch: Partial<S['source']>): S => ({ ...s, source: { ...s.source, ...patch } });
export const withDust = (s: S, patch: Partial<S['dust']>): S => ({ ...s, dust: { ...s.dust, ...patch } });
export const withWorker = (s: S, patch: Partial<S['worker']>): S => ({ ...s, worker: { ...s.worker, ...patch } });
export const withRun = (s: S, patch: Partial<NonNullable<S['run']>>): S => ({ ...s, run: { ...s.run, ...patch } });

export function withHood(s: S, index: number, patch: Partial<NonNullable<S['hoods']>[number]>): S {
  const hoods = (s.hoods ?? []).map((h, i) => (i === index ? { ...h, ...patch } : h));
  return { ...s, hoods };
}

export function withoutHood(s: S, index: number): S {
  return { ...s, hoods: (s.hoods ?? []).filter((_, i) => i !== index) };
}
