import { formatSig, readableNumber } from '../../../../shared/format/index';
import { STOKES_REYNOLDS_LIMIT, type ParticleProperties } from '@/features/calculators/lib/particle-properties';
import { displayDiameter, plainNumber } from '@/features/calculators/lib/format';
import { ResultGrid, ResultItem } from './result-item';

function StokesVerdict({ p }: { p: ParticleProperties }) {
  const re = readableNumber(p.reynolds, 2);
  if (p.reynolds < STOKES_REYNOLDS_LIMIT) {
    return (
      <p data-testid="stokes-verdict" className="text-clear">
        <span aria-hidden="true">✓ </span>Stokes&apos; law holds: particle Reynolds number {re}, below {STOKES_REYNOLDS_LIMIT}.
      </p>
    );
  }
  return (
    <p data-testid="stokes-verdict" className="text-watch">
      <span aria-hidden="true">! </span>Beyond Stokes&apos; law: particle Reynolds number {re}, above {STOKES_REYNOLDS_LIMIT}. The velocity
      shown is drag-corrected (Schiller–Naumann); Stokes alone would give {readableNumber(p.stokesVelocity_mPerS)} m/s.
    </p>
  );
}

export function ParticleResults({ p, window_s }: { p: ParticleProperties; window_s: number }) {
  const over = `over ${plainNumber(window_s)} s`;
  return (
    <section aria-labelledby="particle-results" className="space-y-4">
      <h2 id="particle-results">Results for {displayDiameter(p.diameter_m)}</h2>
      <ResultGrid label="Particle results">
        <ResultItem
          label="Settling velocity"
          value={readableNumber(p.settlingVelocity_mPerS)}
          unit="m/s"
          testId="settling-velocity"
          note={<StokesVerdict p={p} />}
        />
        <ResultItem
          label="Slip factor"
          value={readableNumber(p.slipFactor, 4)}
          unit="–"
          testId="slip-factor"
          note="Cunningham correction, Hinds Eq. 3.20"
        />
        <ResultItem label="Particle Reynolds number" value={readableNumber(p.reynolds, 2)} unit="–" testId="particle-reynolds" />
        <ResultItem label="Relaxation time" value={readableNumber(p.relaxationTime_s)} unit="s" testId="relaxation-time" />
        <ResultItem label="Brownian diffusivity" value={readableNumber(p.diffusivity_m2PerS)} unit="m²/s" testId="diffusivity" />
        <ResultItem
          label="Aerodynamic diameter"
          value={readableNumber(p.aerodynamicDiameter_m * 1e6)}
          unit="µm"
          testId="aerodynamic-diameter"
        />
        <ResultItem label={`Settling distance ${over}`} value={readableNumber(p.settlingDistance_m)} unit="m" testId="settling-distance" />
        <ResultItem
          label={`RMS Brownian displacement ${over}`}
          value={readableNumber(p.rmsDisplacement_m)}
          unit="m"
          testId="rms-displacement"
          note="Along one axis, √(2Dt)"
        />
      </ResultGrid>
      <h3 className="text-sm font-semibold">Health-related fractions (ISO 7708, by aerodynamic diameter)</h3>
      <ResultGrid label="Health-related fractions">
        <ResultItem
          label="Inhalable"
          value={formatSig(100 * p.inhalable, 3)}
          unit="%"
          testId="inhalable-fraction"
          note={p.aerodynamicDiameter_m > 1e-4 ? 'ISO 7708 stops at 100 µm; counted as none beyond it' : undefined}
        />
        <ResultItem label="Thoracic" value={formatSig(100 * p.thoracic, 3)} unit="%" testId="thoracic-fraction" />
        <ResultItem label="Respirable" value={formatSig(100 * p.respirable, 3)} unit="%" testId="respirable-fraction" />
      </ResultGrid>
    </section>
  );
}
