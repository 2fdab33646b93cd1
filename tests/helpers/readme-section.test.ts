import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { writeReadmeSection } from './readme-section';

describe('writeReadmeSection', () => {
  it('replaces only the marked block and keeps the rest of the file', () => {
    const file = path.join(fs.mkdtempSync(path.join(os.tmpdir(), 'readme-')), 'README.md');
    fs.writeFileSync(file, 'before\n<!-- load:start -->\nold\n<!-- load:end -->\nafter\n');
    writeReadmeSection('load', ['- 250 requests/s'], file);
    const text = fs.readFileSync(file, 'utf8');
    expect(text.startsWith('before\n<!-- load:start -->\nMeasured ')).toBe(true);
    expect(text).toContain('- 250 requests/s\n<!-- load:end -->\nafter\n');
    expect(text).not.toContain('old');
  });

  it('refuses a README without the block', () => {
    const file = path.join(fs.mkdtempSync(path.join(os.tmpdir(), 'readme-')), 'README.md');
    fs.writeFileSync(file, 'nothing here');
    expect(() => writeReadmeSection('bench', ['x'], file)).toThrow(/no <!-- bench:start -->/);
  });
});
