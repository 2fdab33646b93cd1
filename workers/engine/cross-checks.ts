import { eddyContinuousSource, nearFieldFarField, wellMixedConcentration } from '../../shared/physics/index';
import { pow } from '../../shared/det-math/index';
import type { Fraction, PreparedScenario, Results } from './types';
import { FRACTIONS } from './types';

const SAMPLES = 200;

function timeAverage(duration_s: number, at: (t: number) => number): number {
  let sum = 0;
  for (let i = 0; i < SAMPLES; i++) sum += at(((i + 0.5) / SAMPLES) * duration_s);
  return sum / SAMPLES;
}

/**
 * Box models evaluated bin by bin from the size profile's own mass shares (profileMassFraction, not
 * the particles' bins, so a run of 20 particles gets the same figures as one of 20 000), over the
 * simulated sizes only, as the Monte-Carlo figure is: mass left out of the size range is in
 * neither. Generation = emitted mass
 * over the release time (bursts averaged), removal = general ventilation plus hood airflow (both
 * take air out of the room), settling loss V_TS/H per bin, averaged over the simulated window.
 * Near field: a sphere (hemisphere on the floor) of radius max(source-to-zone distance, zone
 * radius) with β = ½·FSA·s. Eddy: steady point source at the source-to-zone distance with the
 * room's eddy diffusivity and loss rate ACH/3600 + V_TS/H.
 */
export function crossChecks(p: PreparedScenario, fraction: Fraction): Results['crossChecks'] {
  const { bins, room, crossCheck: c, duration_s } = p;
  const f = FRACTIONS.indexOf(fraction);
  const airflow = c.airflow_m3PerS + c.hoodAirflow_m3PerS;
  const release_s = Math.max(p.emission.release_s, 1e-9);
  const radius = Math.max(c.sourceToZone_m, p.zone.radius_m);
  const surface = (c.sourceOnFloor ? 2 : 4) * Math.PI * radius * radius;
  const nearVolume = Math.min(((c.sourceOnFloor ? 2 : 4) / 3) * Math.PI * pow(radius, 3), 0.5 * room.volume_m3);
  const beta = 0.5 * surface * c.randomAirSpeed_mPerS;
  let wellMixed = 0;
  let near = 0;
  let far = 0;
  let eddy = 0;
  for (let b = 0; b < bins.count; b++) {
    const g = (p.emission.emitted_mg * bins.profileMassFraction[b] * bins.conventionWeight[f * bins.count + b]) / release_s;
    if (g === 0) continue;
    const settle = bins.settling_mPerS[b] / room.height_m;
    // Linear models: switching the source off at T is the source minus itself delayed by T.
    const switched = (response: (t: number) => number) => (t: number) => response(t) - (t > release_s ? response(t - release_s) : 0);
    wellMixed += timeAverage(
      duration_s,
      switched((t) =>
        wellMixedConcentration({ generation_mgPerS: g, airflow_m3PerS: airflow, volume_m3: room.volume_m3, lossRate_perS: settle }, t),
      ),
    );
    if (airflow > 0 || settle > 0) {
      const model = {
        generation_mgPerS: g,
        airflow_m3PerS: airflow,
        nearFieldVolume_m3: nearVolume,
        farFieldVolume_m3: room.volume_m3 - nearVolume,
        interzonalAirflow_m3PerS: beta,
        lossRate_perS: settle,
      };
      near += timeAverage(
        duration_s,
        switched((t) => nearFieldFarField(model, t).near_mgPerM3),
      );
      far += timeAverage(
        duration_s,
        switched((t) => nearFieldFarField(model, t).far_mgPerM3),
      );
    }
    if (p.eddyDiffusivity_m2PerS > 0) {
      const loss = airflow / room.volume_m3 + settle;
      eddy += eddyContinuousSource(
        {
          generation_mgPerS: g,
          diffusivity_m2PerS: p.eddyDiffusivity_m2PerS,
          lossRate_perS: loss,
          boundary: c.sourceOnFloor ? 'floor' : 'free',
        },
        radius,
        Infinity,
      );
    }
  }
  return { fraction, wellMixed_mgPerM3: wellMixed, nearField_mgPerM3: near, farField_mgPerM3: far, eddySteady_mgPerM3: eddy };
}
