import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseScenario } from '../../../../shared/schemas/scenario';
import { buildColumn } from './build-column';

const demo = parseScenario(JSON.parse(readFileSync(new URL('../../../../shared/demo-scenarios/default.json', import.meta.url), 'utf8')));
const scenario = (input: object) => ({
  id: 1,
  name: 'Flanged hood',
  workstationName: 'Bench',
  siteName: 'Site',
  controlTier: 'engineering',
  controlDescription: '',
  input,
});

describe('a side-by-side column', () => {
  it("carries the capture speed at the source in words: 0.47 m/s for the stone bench hood (issue 14's hand calculation)", () => {
    expect(buildColumn(scenario(demo), null, null).capture).toMatch(/^0\.47 m\/s at the source; .* needs 2\.5–10 m\/s/);
  });

  it('says nothing of capture without a hood, and says what is missing without a release type', () => {
    expect(buildColumn(scenario({ ...demo, hoods: [] }), null, null).capture).toBeNull();
    expect(buildColumn(scenario({ ...demo, source: { ...demo.source, releaseType: undefined } }), null, null).capture).toBe(
      'No release type is given for the source.',
    );
  });
});
