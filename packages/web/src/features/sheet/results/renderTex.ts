import katex from 'katex';

/**
 * KaTeX settings for everything the sheet typesets: no `\href`/`\includegraphics`/HTML
 * extensions (`trust: false`), bounded macro expansion and sizes, so a note typed by anyone
 * cannot hang or flood the page. Errors are shown in place (in the fail colour), never thrown.
 */
export const KATEX_OPTIONS = {
  trust: false,
  maxExpand: 500,
  maxSize: 20,
  strict: 'ignore',
  throwOnError: false,
  errorColor: '#a3272b',
} as const;

const cache = new Map<string, string>();
const CACHE_LIMIT = 2000;

/** LaTeX to KaTeX HTML (with MathML for screen readers), cached by text and mode. */
export function renderTex(latex: string, displayMode: boolean): string {
  const key = `${displayMode ? 'D' : 'I'}${latex}`;
  const hit = cache.get(key);
  if (hit !== undefined) return hit;
  const html = katex.renderToString(latex, { ...KATEX_OPTIONS, displayMode });
  if (cache.size >= CACHE_LIMIT) cache.delete(cache.keys().next().value as string);
  cache.set(key, html);
  return html;
}
