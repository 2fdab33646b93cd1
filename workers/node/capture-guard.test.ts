import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseScenario } from '../../shared/schemas/scenario';
import { combineBatches } from '../engine/combine';
import { runAll } from '../engine/engine.test-helper';
import { prepareScenario } from '../engine/prepare';

// The demo's own file, as a user would open it (lives in shared/, read from here where Node's fs is at hand).
const demo = JSON.parse(readFileSync(new URL('../../shared/demo-scenarios/default.json', import.meta.url), 'utf8'));

// The trade's capture-velocity table (ACGIH, Industrial Ventilation): grinding is a high-energy release, 2.5–10 m/s.
// The default demo's flanged hood gives 0.47 m/s at the source by the Dalla Valle flanged equation, under half of 2.5.
describe('a hood far below the capture velocity its release needs', () => {
  it('is flagged at preparation from the hand calculation, whatever the walk says', () => {
    expect(prepareScenario(parseScenario(demo)).captureVelocity).toBe('below-half');
  });

  it('never reads Clear and says why, even when the simulated exposure alone would', () => {
    // A small run: the guard must hold for any sample the walk gives.
    const prepared = prepareScenario(parseScenario({ ...demo, run: { ...demo.run, particles: 4000, batches: 4 } }));
    const result = combineBatches(prepared, runAll(prepared), 1);
    expect(result.limit?.banner).not.toBe('clear');
    expect(result.limit?.reasons?.join(' ')).toMatch(/below half the lower end/);
  }, 120_000);

  it('is not flagged once the hood is moved close enough to reach the range', () => {
    // Flanged opening 0.35 × 0.25 m at 0.35 m³/s: V(0.1 m) = Q/(0.75(10x² + A)) = 2.49 m/s, below 2.5 but not below half.
    const close = { ...demo, hoods: [{ ...demo.hoods[0], y_m: demo.source.y_m + 0.1 }] };
    expect(prepareScenario(parseScenario(close)).captureVelocity).not.toBe('below-half');
  });
});
