/**
 * Test helpers: a generated comment parsed the way a GFM renderer sees it (micromark with its GFM
 * extension), as HTML, as a DOM (jsdom), and as the list of raw-HTML chunks the parser found.
 */
import { JSDOM } from 'jsdom';
import { micromark, parse, postprocess, preprocess } from 'micromark';
import { gfm, gfmHtml } from 'micromark-extension-gfm';

/** The comment as HTML, raw HTML passed through (as GitHub would, before its own sanitizer). */
export function toHtml(markdown: string): string {
  return micromark(markdown, {
    allowDangerousHtml: true,
    extensions: [gfm()],
    htmlExtensions: [gfmHtml()],
  });
}

const { window } = new JSDOM('<!doctype html>');

/** The comment's HTML in a fresh document (one shared jsdom window keeps this fast). */
export function toDocument(markdown: string): Document {
  const doc = window.document.implementation.createHTMLDocument('');
  doc.body.innerHTML = toHtml(markdown);
  return doc;
}

/** Every raw HTML chunk (flow and inline) the GFM parser recognised in the markdown. */
export function rawHtml(markdown: string): string[] {
  const events = postprocess(
    parse({ extensions: [gfm()] })
      .document()
      .write(preprocess()(markdown, undefined, true)),
  );
  const out: string[] = [];
  for (const [kind, token, context] of events) {
    if (kind === 'enter' && (token.type === 'htmlFlow' || token.type === 'htmlText')) {
      out.push(context.sliceSerialize(token));
    }
  }
  return out;
}

/** Shape of each table: [rows including the header, columns of each row]. */
export function tableShapes(doc: Document): { rows: number; columns: number[] }[] {
  return [...doc.querySelectorAll('table')].map((table) => {
    const rows = [...table.querySelectorAll('tr')];
    return { rows: rows.length, columns: rows.map((r) => r.querySelectorAll('th, td').length) };
  });
}

/** The Mermaid sources of a comment, in order. */
export function mermaidBlocks(markdown: string): string[] {
  return [...markdown.matchAll(/^```mermaid\n([\s\S]*?)\n```$/gm)].map((m) => m[1] ?? '');
}
