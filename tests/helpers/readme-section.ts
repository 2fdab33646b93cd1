import fs from 'node:fs';
import path from 'node:path';

// Benchmark and load scripts own a marked block of the README, so the figures there are always their latest output.
export function writeReadmeSection(name: string, lines: string[], readme = path.resolve('README.md')): void {
  const start = `<!-- ${name}:start -->`;
  const end = `<!-- ${name}:end -->`;
  const text = fs.readFileSync(readme, 'utf8');
  const from = text.indexOf(start);
  const to = text.indexOf(end);
  if (from < 0 || to < from) throw new Error(`README.md has no ${start} … ${end} block`);
  const stamp = `Measured ${new Date().toISOString().slice(0, 16).replace('T', ' ')} UTC by \`npm run ${name}\`:`;
  fs.writeFileSync(readme, `${text.slice(0, from + start.length)}\n${stamp}\n\n${lines.join('\n')}\n${text.slice(to)}`);
}
