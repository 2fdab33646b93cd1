import { percentText } from '../../shared/format/index';
import type { RunResult } from '../../shared/schemas/run-result';
import { FRACTIONS } from '../../shared/vocabulary/fractions';

const mg = (v: number) => (v >= 0.1 ? v.toFixed(3) : v.toPrecision(3));
const pct = (v: number) => percentText(100 * v);

// Typed arrays would serialise as index-keyed objects; the JSON output wants plain arrays.
export function resultsToJson(results: RunResult): string {
  return JSON.stringify(results, (_key, value: unknown) => (ArrayBuffer.isView(value) ? Array.from(value as Float32Array) : value), 2);
}

export function summary(name: string, r: RunResult): string {
  const lines = [
    `${name}`,
    `engine ${r.engine.version}, seed ${r.engine.seed}, ${r.engine.particles} particles in ${r.engine.batches} batches, ${r.engine.sizeBins} size bins`,
    '',
    'Breathing zone (mg/m³)     task mean [95 % CI]            8-h TWA [95 % CI]              peak 15 min [95 % CI]',
  ];
  for (const f of FRACTIONS) {
    const s = r.breathingZone.fractions[f];
    const task = `${mg(s.taskMean_mgPerM3)} [${mg(s.taskMeanCi95_mgPerM3[0])}, ${mg(s.taskMeanCi95_mgPerM3[1])}]`;
    const twa = `${mg(s.twa8h_mgPerM3)} [${mg(s.twa8hCi95_mgPerM3[0])}, ${mg(s.twa8hCi95_mgPerM3[1])}]`;
    const peakCi = s.peak15minCi95_mgPerM3 ? ` [${mg(s.peak15minCi95_mgPerM3[0])}, ${mg(s.peak15minCi95_mgPerM3[1])}]` : '';
    lines.push(`  ${f.padEnd(24)} ${task.padEnd(30)} ${twa.padEnd(30)} ${mg(s.peak15min_mgPerM3)}${peakCi}`);
  }
  if (r.limit) {
    const l = r.limit;
    lines.push(
      '',
      `Limit ${l.value_mgPerM3} mg/m³ (${l.fraction}): ${percentText(l.percentOfLimit)} of limit (upper CI ${percentText(l.percentOfLimitUpper)}), rating category ${l.ratingCategory}, banner ${l.banner.toUpperCase()}`,
    );
    if (l.p95_mgPerM3 !== undefined)
      lines.push(`Daily 95th percentile ${mg(l.p95_mgPerM3)} mg/m³ (day-to-day GSD ${l.gsd}); ${l.decided ? 'decided' : 'not decided'}`);
    if (l.shortTerm)
      lines.push(
        `Peak 15-min average ${percentText(l.shortTerm.percentOfLimit)} of the short-term limit ${l.shortTerm.value_mgPerM3} mg/m³ (upper CI ${percentText(l.shortTerm.percentOfLimitUpper)})`,
      );
    for (const reason of l.reasons ?? []) lines.push(`  ${reason}`);
  }
  const stop = r.engine.stopping;
  if (stop) {
    const looks = stop.looks.map((k) => `${k.batches}: ${mg(k.ci_mgPerM3[0])}–${mg(k.ci_mgPerM3[1])}`).join('; ');
    lines.push(
      '',
      `Run to ±${percentText(100 * stop.relativeHalfWidth)} or a decision: stopped at ${r.engine.batches} batches (${stop.reason}); looks ${looks}`,
    );
  }
  const fate = r.fate;
  lines.push(
    '',
    `Fate of ${fate.emitted_mg.toFixed(1)} mg emitted: captured ${pct(fate.captured)}, settled ${pct(fate.settled)}, exhausted ${pct(fate.exhausted)}, airborne at end ${pct(fate.airborne)}`,
  );
  const c = r.crossChecks;
  lines.push(
    `Cross-checks (${c.fraction}, mg/m³): well-mixed ${mg(c.wellMixed_mgPerM3)}, near field ${mg(c.nearField_mgPerM3)}, far field ${mg(c.farField_mgPerM3)}, eddy steady ${mg(c.eddySteady_mgPerM3)}`,
  );
  const p = r.performance;
  lines.push(
    `Performance: ${(p.particleSteps / 1e6).toFixed(1)} M particle-steps in ${p.wallTime_s.toFixed(2)} s (${(p.particleStepsPerS / 1e6).toFixed(1)} M/s)`,
  );
  lines.push('', 'Model estimates, not measurements: they do not replace personal air sampling.');
  return lines.join('\n');
}
