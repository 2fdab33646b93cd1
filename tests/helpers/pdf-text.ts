import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';

/** The text of each page of a PDF, its pieces joined by single spaces, as a reader's copy-and-paste would give it. */
export async function pdfPageTexts(pdf: Uint8Array): Promise<string[]> {
  // Fonts are only read for their character maps here; nothing is drawn, so no worker or canvas is needed.
  const doc = await getDocument({ data: pdf, isEvalSupported: false, useSystemFonts: false }).promise;
  try {
    const pages: string[] = [];
    for (let n = 1; n <= doc.numPages; n++) {
      const content = await (await doc.getPage(n)).getTextContent();
      const text = content.items.map((item) => ('str' in item ? item.str : '')).join(' ');
      pages.push(text.replace(/\s+/g, ' ').trim());
    }
    return pages;
  } finally {
    await doc.destroy();
  }
}
