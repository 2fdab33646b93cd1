import { parseArgs } from 'node:util';

export interface SimArgs {
  file: string;
  particles?: number;
  seed?: number | string;
  workers?: number;
  json: boolean;
  /** Run at ½×, 1× and 2× the release jet's speed and print the three verdicts side by side. */
  jetSensitivity: boolean;
}

export const USAGE = 'usage: npm run sim -- <scenario.json> [--particles N] [--seed S] [--workers K] [--json] [--jet-sensitivity]';

function positiveInt(name: string, text: string | undefined): number | undefined {
  if (text === undefined) return undefined;
  const value = Number(text);
  if (!Number.isInteger(value) || value < 1) throw new Error(`--${name} must be a whole number of at least 1, got ${JSON.stringify(text)}`);
  return value;
}

export function parseSimArgs(argv: string[]): SimArgs {
  const { values, positionals } = parseArgs({
    args: argv,
    allowPositionals: true,
    options: {
      particles: { type: 'string' },
      seed: { type: 'string' },
      workers: { type: 'string' },
      json: { type: 'boolean', default: false },
      'jet-sensitivity': { type: 'boolean', default: false },
    },
  });
  if (positionals.length !== 1) throw new Error(`expected one scenario file, got ${positionals.length}`);
  const seedText = values.seed;
  const seed = seedText === undefined ? undefined : /^-?\d+$/.test(seedText) ? Number(seedText) : seedText;
  return {
    file: positionals[0],
    particles: positiveInt('particles', values.particles),
    seed,
    workers: positiveInt('workers', values.workers),
    json: values.json ?? false,
    jetSensitivity: values['jet-sensitivity'] ?? false,
  };
}
