import { parseScenario } from '../../shared/schemas/scenario';
import { atan, atan2, cos, exp, expm1, log, pow, sin } from '../../shared/det-math/index';
import { batchTally, prepareScenario, runBatch } from '../../workers/engine/index';
import { TallyHash } from '../../workers/engine/tally-hash';
import { workstation } from '../../workers/engine/workstation.test-helper';

// The golden test's bench (seed 2024), and the same with a disc source in a stronger draft, so
// the release's sin, cos and log and the walk's exp all take part (the hood's sink panels take atan2 and log).
const GOLDEN = [
  { ...workstation, run: { particles: 1000, batches: 4, seed: 2024 } },
  {
    ...workstation,
    room: { ...workstation.room, draftSpeed_mPerS: 0.3 },
    source: { ...workstation.source, shape: 'disc', size_m: 0.3 },
    run: { particles: 800, batches: 2, seed: 'bits' },
  },
];

/** Hashes of golden batches and of the deterministic maths over a spread of arguments: compared between JavaScript engines. */
export function engineBits(): { batches: string[]; maths: string } {
  const batches: string[] = [];
  for (const input of GOLDEN) {
    const p = prepareScenario(parseScenario(input));
    for (let k = 0; k < p.batches; k++) batches.push(batchTally(p, runBatch(p, k)).hash);
  }
  const h = new TallyHash();
  for (let i = 1; i <= 5000; i++) {
    const x = (i * 0.7390851332151607) % 50;
    h.number(exp(x - 25));
    h.number(log(x * 1e3));
    h.number(sin(x * 7));
    h.number(cos(x * 7));
    h.number(pow(x, 0.687));
    h.number(atan(x - 25));
    h.number(atan2(x - 25, 10 - x));
    h.number(expm1((x - 25) * 0.01));
  }
  return { batches, maths: h.hex() };
}
