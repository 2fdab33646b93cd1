import { fireEvent, render, screen } from '@testing-library/react';
import { useState } from 'react';
import { describe, expect, it } from 'vitest';
import type { HoodInput } from '@/features/scenario-editor/lib/hood-axis';
import { HoodFields } from './hood-fields';
import { HoodHints } from './hood-hints';

const flanged: HoodInput = {
  kind: 'flanged',
  x_m: 4,
  y_m: 3.3,
  z_m: 0.9,
  direction: { azimuth_deg: 270, elevation_deg: 0 },
  faceWidth_m: 1,
  faceHeight_m: 0.6,
  airflow_m3PerS: 0.372,
};
const source = { x_m: 4, y_m: 3, z_m: 0.9 };

function Harness({ start, onValue }: { start: HoodInput; onValue: (h: HoodInput) => void }) {
  const [hood, setHood] = useState(start);
  return (
    <>
      <HoodFields
        hood={hood}
        index={0}
        errors={{}}
        onRemove={() => {}}
        onChange={(patch) => {
          const next = { ...hood, ...patch };
          setHood(next);
          onValue(next);
        }}
      />
      <HoodHints hood={hood} index={0} source={source} releaseType="active" />
    </>
  );
}

describe('hood fields for a downdraft bench', () => {
  it('offer the bench in the kind list, and on choosing it face up and ask for the work surface', () => {
    let last = flanged;
    render(<Harness start={flanged} onValue={(h) => (last = h)} />);
    expect(screen.getByLabelText('Faces toward')).toBeTruthy();
    expect(screen.getByLabelText(/^Face width/)).toBeTruthy();

    fireEvent.change(screen.getByLabelText('Kind'), { target: { value: 'downdraft-bench' } });
    expect(last).toMatchObject({ kind: 'downdraft-bench', direction: { x: 0, y: 0, z: 1 } });
    expect(screen.queryByLabelText('Faces toward')).toBeNull();
    expect(screen.queryByLabelText('Tilt')).toBeNull();
    const faces = screen.getByLabelText('Faces') as HTMLInputElement;
    expect([faces.value, faces.readOnly]).toEqual(['Up', true]);
    expect(screen.getByLabelText(/^Work surface length/)).toBeTruthy();
    expect(screen.getByLabelText(/^Work surface depth/)).toBeTruthy();
    expect(screen.queryByLabelText(/^Face width/)).toBeNull();
  });

  it('read the bench by its face velocity over the work surface (0.5–1.0 m/s, common practice)', () => {
    // [C] 0.372 m³/s over 1 m × 0.6 m is 0.62 m/s; the source is 0.1 m above the surface, inside its outline.
    render(<Harness start={{ ...flanged, kind: 'downdraft-bench', z_m: 0.8, direction: { x: 0, y: 0, z: 1 } }} onValue={() => {}} />);
    const verdict = screen.getByTestId('hood-verdict-0').textContent ?? '';
    expect(verdict).toContain('0.62 m/s over the work surface');
    expect(verdict).toContain('Within the 0.50–1.0 m/s downdraft benches need (common practice: confirm against local guidance)');
    expect(screen.getByTestId('hood-hints-0').textContent).not.toContain('centre line');
  });

  it('say the guidance does not apply when the source is not over the work surface', () => {
    render(<Harness start={{ ...flanged, kind: 'downdraft-bench', z_m: 0.3, direction: { x: 0, y: 0, z: 1 } }} onValue={() => {}} />);
    expect(screen.getByTestId('hood-verdict-0').textContent).toContain('The source is not over the work surface');
  });
});
