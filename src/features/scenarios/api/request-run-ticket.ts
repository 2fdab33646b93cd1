import type { RunTicket } from '../../../../shared/schemas/runs';
import type { Scenario } from '../../../../shared/schemas/scenario';
import { ENGINE_VERSION } from '../../../../workers/engine/index';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';

/** A single-use seed from the server for one run that may be saved (never cached: each run needs its own). */
export const requestRunTicket = (scenarioId: number) => apiFetch<RunTicket>(api.runTickets(scenarioId), { method: 'POST', body: {} });

export type TicketRequest = () => Promise<RunTicket>;

export class StaleEngineError extends Error {
  constructor(serverVersion: string) {
    super(`The server runs engine ${serverVersion}; this page still has engine ${ENGINE_VERSION}. Reload the page and run again.`);
    this.name = 'StaleEngineError';
  }
}

/** The scenario with the ticket's seed, refused before running when this page's engine is not the server's. */
export async function ticketedScenario(scenario: Scenario, request: TicketRequest): Promise<{ input: Scenario; ticket: string }> {
  const t = await request();
  if (t.engineVersion !== ENGINE_VERSION) throw new StaleEngineError(t.engineVersion);
  return { input: { ...scenario, run: { ...scenario.run, seed: t.seed } }, ticket: t.ticket };
}
