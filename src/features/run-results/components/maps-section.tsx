import { readableNumber, trimSig } from '../../../../shared/format/index';
import { captureVelocityRange } from '../../../../shared/physics/index';
import type { Scenario } from '../../../../shared/schemas/scenario';
import { sequentialScale } from '@/features/run-results/lib/colour-scale';
import type { RunResult } from '../../../../shared/schemas/run-result';
import { ColourLegend } from './colour-legend';
import { GridMap } from './grid-map';
import { Section } from './section';

export function MapsSection({ view, scenario }: { view: RunResult; scenario: Scenario }) {
  const dep = view.maps.deposition_mgPerM2;
  const cap = view.maps.captureVelocity_mPerS;
  const release = scenario.source.releaseType;
  const range = release ? captureVelocityRange(release) : undefined;
  const depScale = dep && sequentialScale(dep.values);
  const near = view.maps.captureVelocityNear_mPerS;
  // One colour scale over both capture maps, so the close-up and the room agree where they overlap.
  const capScale = cap && sequentialScale(near ? Float32Array.from([...cap.values, ...near.values]) : cap.values);
  return (
    <Section
      title="Floor deposition and capture velocity"
      intro="Both maps are plans of the room with the source, hood faces and breathing zone on top; each opens zoomed on the workstation."
    >
      <div className="grid gap-4 lg:grid-cols-2">
        <figure className="rounded-lg border border-line bg-white p-3">
          <figcaption className="mb-2 text-sm font-semibold">Dust settled on the floor</figcaption>
          {dep && depScale ? (
            <>
              <GridMap
                grid={dep}
                scale={depScale}
                scenario={scenario}
                skipZero
                what="deposition map"
                label={`Floor deposition map, up to ${readableNumber(Math.max(...dep.values))} mg/m²`}
              />
              <ColourLegend scale={depScale} unit="mg/m²" title="Deposited mass per floor area" />
              <p className="mt-1 text-xs text-muted">White cells received no simulated particle.</p>
            </>
          ) : (
            <p className="text-sm text-muted">This run holds no deposition map.</p>
          )}
        </figure>
        <figure className="rounded-lg border border-line bg-white p-3">
          <figcaption className="mb-2 text-sm font-semibold">
            Air speed towards the hoods{cap ? ` at ${trimSig(cap.height_m, 3)} m, the source height` : ''}
          </figcaption>
          {cap && capScale ? (
            <>
              <GridMap
                grid={cap}
                scale={capScale}
                scenario={scenario}
                what="capture-velocity map"
                detail={near}
                label={`Capture-velocity map, ${readableNumber(Math.min(...cap.values))} to ${readableNumber(capScale.max)} m/s`}
              />
              <ColourLegend
                scale={capScale}
                unit="m/s"
                title="Capture velocity (hoods plus cross-draft)"
                band={
                  range && {
                    from: range.min_mPerS,
                    to: Math.min(range.max_mPerS, capScale.max),
                    label: `${release} release: ${range.min_mPerS}–${range.max_mPerS} m/s`,
                  }
                }
              />
              <p className="mt-1 text-xs text-muted">
                {near ? 'Finer cells cover the workstation. ' : ''}
                {range
                  ? `Published capture velocity for ${release} release (${range.description.toLowerCase()}): ${range.min_mPerS}–${range.max_mPerS} m/s (ACGIH Industrial Ventilation). The source should sit where the map reaches this range.`
                  : 'No release type is given for the source, so no published capture-velocity range is shown.'}
              </p>
            </>
          ) : (
            <p className="text-sm text-muted">This run holds no capture-velocity map.</p>
          )}
        </figure>
      </div>
    </Section>
  );
}
