// esbuild comes with Vite (not a dependency of its own); only this test bundles with it directly.
// eslint-disable-next-line import/no-extraneous-dependencies
import { build } from 'esbuild';
import { describe, expect, it } from 'vitest';
import { launchBrowser } from '../helpers/browser';
import { engineBits } from '../helpers/engine-bits';

// The server replays browser runs in Node and must get the same bits: the engine, bundled for the
// page as the app bundles it, hashes its golden batches and its own maths; Node computes the same.
describe('the engine gives the same bits in Chromium as in Node', () => {
  it('hashes golden batches and the deterministic maths identically in both', async () => {
    const bundle = await build({
      entryPoints: ['tests/helpers/engine-bits.ts'],
      bundle: true,
      write: false,
      format: 'iife',
      globalName: 'motewalkBits',
      platform: 'browser',
      target: 'es2022',
      logLevel: 'silent',
    });
    const browser = await launchBrowser();
    try {
      const page = await browser.newPage();
      await page.setContent('<!doctype html><title>engine bits</title>');
      await page.addScriptTag({ content: bundle.outputFiles[0].text });
      const inBrowser = await page.evaluate(() =>
        (globalThis as unknown as { motewalkBits: { engineBits: typeof engineBits } }).motewalkBits.engineBits(),
      );
      const inNode = engineBits();
      expect(inBrowser.batches).toHaveLength(6);
      expect(new Set(inNode.batches).size).toBe(6);
      expect(inBrowser).toEqual(inNode);
    } finally {
      await browser.close();
    }
  });
});
