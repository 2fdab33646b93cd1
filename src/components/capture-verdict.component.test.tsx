import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import demoText from '../../shared/demo-scenarios/default.json?raw';
import joineryText from '../../shared/demo-scenarios/joinery-sander-downdraft-bench.json?raw';
import { parseScenario } from '../../shared/schemas/scenario';
import { CaptureVerdict } from './capture-verdict';

const demo = () => parseScenario(JSON.parse(demoText));

describe('capture verdict beside a result', () => {
  it("says the stone bench hood gives 0.47 m/s at the source against grinding's 2.5–10 m/s (issue 14's hand calculation)", () => {
    render(<CaptureVerdict scenario={demo()} />);
    expect(screen.getByTestId('capture-verdict').textContent).toMatch(
      /^▼▼0\.47 m\/s at the source; a high-velocity release \(flung out fast into very fast-moving air\) needs 2\.5–10 m\/s \(less than half the low end\)\./,
    );
  });

  it('says why there is no comparison when the source has no release type, and nothing without a hood', () => {
    const s = demo();
    const { unmount } = render(<CaptureVerdict scenario={{ ...s, source: { ...s.source, releaseType: undefined } }} />);
    expect(screen.getByTestId('capture-verdict').textContent).toMatch(/No release type is given for the source/);
    unmount();
    render(<CaptureVerdict scenario={{ ...s, hoods: [] }} />);
    expect(screen.queryByTestId('capture-verdict')).toBeNull();
  });

  it('reads the joinery bench by its face velocity over the work surface, marked common practice ([C] 0.6 m³/s ÷ 0.6 m²)', () => {
    render(<CaptureVerdict scenario={parseScenario(JSON.parse(joineryText))} />);
    const text = screen.getByTestId('capture-verdict').textContent ?? '';
    expect(text).toMatch(
      /^✓1\.0 m\/s over the work surface; downdraft benches need 0\.50–1\.0 m\/s \(common practice; within the range\)\. Confirm against local guidance\./,
    );
    expect(text).toContain('The range is common practice, not a published figure.');
    expect(text).not.toContain('centre line');
  });
});
