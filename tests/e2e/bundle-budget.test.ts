import fs from 'node:fs';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import { describe, expect, it } from 'vitest';

const DIST = path.resolve('dist');
const BUDGET_BYTES = 250 * 1024;

// Initial JS = the entry script plus every chunk index.html preloads; lazy pages are not counted.
function initialScripts(): string[] {
  const html = fs.readFileSync(path.join(DIST, 'index.html'), 'utf8');
  const refs = [
    ...html.matchAll(/<script[^>]+src="([^"]+\.js)"/g),
    ...html.matchAll(/<link[^>]+rel="modulepreload"[^>]+href="([^"]+\.js)"/g),
  ].map((m) => m[1]);
  return [...new Set(refs)].map((r) => path.join(DIST, r.replace(/^\//, '')));
}

describe('performance budget of the built client', () => {
  it(`keeps the initial JavaScript under ${BUDGET_BYTES / 1024} kB gzip`, () => {
    const files = initialScripts();
    expect(files.length).toBeGreaterThan(0);
    const sizes = files.map((f) => ({ file: path.basename(f), gzip: gzipSync(fs.readFileSync(f), { level: 9 }).length }));
    const total = sizes.reduce((s, x) => s + x.gzip, 0);
    console.log(`initial JS: ${(total / 1024).toFixed(1)} kB gzip in ${sizes.length} file(s) (budget ${BUDGET_BYTES / 1024} kB)`);
    expect(total).toBeLessThanOrEqual(BUDGET_BYTES);
  });
});
