import type { Locator, Page } from 'playwright-core';
import { expect } from 'vitest';

// Measurements of a page laid out on a phone, for the browser tests at 390 px.

// 390 px is a common phone width (common practice for mobile layouts).
export const PHONE = { width: 390, height: 844 };

/** How far the page scrolls sideways (0 when nothing sticks out). */
export const sideways = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);

export type TableLayout = {
  name: string;
  boxed: boolean;
  fits: boolean;
  overflows: boolean;
  scrolled: number;
  firstLeft: number;
  boxLeft: number;
  right: number;
  opaque: boolean;
};

// Scrolls the box of every table shown under root to its far right, then measures where each first column ended up.
export const scrollTablesSideways = (root: Locator): Promise<TableLayout[]> =>
  root.evaluate(async (el) => {
    const tables = Array.from(el.querySelectorAll('table')).filter((t) => t.getClientRects().length > 0);
    const boxes = tables.map((t) => {
      let b = t.parentElement;
      while (b && b !== document.body && !/auto|scroll/.test(getComputedStyle(b).overflowX)) b = b.parentElement;
      return b === document.body ? null : b;
    });
    for (const b of boxes) if (b) b.scrollLeft = b.scrollWidth;
    await new Promise((done) => requestAnimationFrame(done));
    const seeThrough = (c: Element) => /^transparent$|rgba\(.*,\s*0\)$/.test(getComputedStyle(c).backgroundColor);
    return tables.map((t, i) => {
      const box = boxes[i];
      const firsts = Array.from(t.rows)
        .map((r) => r.cells[0])
        .filter(Boolean);
      const rect = (box ?? t.parentElement!).getBoundingClientRect();
      return {
        name: t.caption?.textContent || t.rows[0]?.cells[0]?.textContent || `table ${i + 1}`,
        boxed: Boolean(box),
        fits: t.getBoundingClientRect().width <= rect.width + 0.5,
        overflows: box ? box.scrollWidth > box.clientWidth + 1 : false,
        scrolled: box?.scrollLeft ?? 0,
        firstLeft: Math.min(...firsts.map((c) => c.getBoundingClientRect().left)),
        boxLeft: rect.left,
        right: rect.right,
        opaque: firsts.every((c) => !seeThrough(c)),
      };
    });
  });

// Each table fits or scrolls in a box of its own inside the screen; scrolled, its first column stays at the box's left edge.
export function expectFirstColumnsInView(tables: TableLayout[]) {
  expect(tables.length).toBeGreaterThan(0);
  for (const t of tables) {
    expect(t.boxed || t.fits, `${t.name}: scrolls in its own box`).toBe(true);
    expect(t.right, `${t.name}: box inside the screen`).toBeLessThanOrEqual(PHONE.width + 0.5);
    if (t.overflows) {
      expect(t.scrolled, `${t.name}: scrolled sideways`).toBeGreaterThan(0);
      expect(t.opaque, `${t.name}: first column has a background`).toBe(true);
    }
    expect(t.firstLeft, `${t.name}: first column in view`).toBeGreaterThanOrEqual(Math.max(0, t.boxLeft - 0.5));
  }
}

// Controls (or what else is asked for) that stick out of the content box of the element they sit in; those
// in a scroll box of their own inside it (a wide table's sort buttons) are left to that box.
export const outside = (box: Locator, selector = 'input, select, textarea, button') =>
  box.evaluate((el, sel) => {
    const r = el.getBoundingClientRect();
    const cs = getComputedStyle(el);
    const left = r.left + parseFloat(cs.borderLeftWidth) + parseFloat(cs.paddingLeft) - 0.5;
    const right = r.right - parseFloat(cs.borderRightWidth) - parseFloat(cs.paddingRight) + 0.5;
    const inScrollBox = (c: Element) => {
      for (let p = c.parentElement; p && p !== el; p = p.parentElement) if (getComputedStyle(p).overflowX !== 'visible') return true;
      return false;
    };
    return Array.from(el.querySelectorAll(sel))
      .filter((c) => c.getClientRects().length > 0 && !inScrollBox(c))
      .map((c) => ({ c, b: c.getBoundingClientRect() }))
      .filter(({ b }) => b.left < left || b.right > right)
      .map(({ c, b }) => `${c.getAttribute('aria-label') ?? c.id ?? c.tagName} ${Math.round(b.left)}–${Math.round(b.right)}`);
  }, selector);

// Drawings with a viewBox: as wide as their box, inside the screen, drawn at the viewBox's own proportions.
export const drawings = (root: Locator) =>
  root.evaluate((el) =>
    Array.from(el.querySelectorAll('svg[viewBox]'))
      .filter((s) => s.getClientRects().length > 0 && s.getAttribute('preserveAspectRatio') !== 'none')
      .map((s) => {
        const r = s.getBoundingClientRect();
        const vb = (s as SVGSVGElement).viewBox.baseVal;
        const p = s.parentElement!;
        const cs = getComputedStyle(p);
        return {
          name: s.getAttribute('aria-label') ?? s.getAttribute('data-testid') ?? 'drawing',
          left: r.left,
          right: r.right,
          width: r.width,
          room: p.clientWidth - parseFloat(cs.paddingLeft) - parseFloat(cs.paddingRight),
          stretch: r.height / r.width / (vb.height / vb.width),
        };
      }),
  );

// Tabs from a form's first field to its save button; every stop must be on screen sideways.
export async function tabThrough(page: Page, form: Locator, last: string) {
  await form.locator('input, select').first().focus();
  const stops: { name: string; left: number; right: number }[] = [];
  for (let i = 0; i < 30; i++) {
    const stop = await page.evaluate(() => {
      const f = document.activeElement as HTMLElement;
      const r = f.getBoundingClientRect();
      return { name: f.textContent?.trim() || f.id, left: r.left, right: r.right };
    });
    stops.push(stop);
    if (stop.name === last) break;
    await page.keyboard.press('Tab');
  }
  expect(stops.at(-1)!.name).toBe(last);
  for (const s of stops) {
    expect(s.left, s.name).toBeGreaterThanOrEqual(0);
    expect(s.right, s.name).toBeLessThanOrEqual(PHONE.width);
  }
}
