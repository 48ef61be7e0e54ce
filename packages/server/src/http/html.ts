const ESCAPES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

/** Escapes text for HTML element content and quoted attribute values. */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (char) => ESCAPES[char] ?? char);
}

const STYLE = `
  body { margin: 0; background: #2b2d30; color: #1d1f22; font: 15px/1.5 system-ui, sans-serif; }
  main { max-width: 46rem; margin: 2.5rem auto; background: #fbf8f1; padding: 1.75rem 2rem;
         border-radius: 6px; box-shadow: 0 2px 10px rgba(0,0,0,.35); }
  h1 { font-size: 1.25rem; margin: 0 0 .25rem; }
  p.lead { color: #55595f; margin: 0 0 1.25rem; }
  code, pre { font-family: ui-monospace, monospace; font-size: 13px; }
  pre { white-space: pre-wrap; background: #f1ede3; padding: .75rem; border-radius: 4px; }
  a { color: #1f5fa8; }
  button { font: inherit; cursor: pointer; }
  .tag { display: inline-block; font-size: 12px; padding: 0 .4rem; border: 1px solid #8a8f96; border-radius: 3px; }
`;

/** A small self-contained page (no scripts, nothing from other origins) in Sheaf's plain look. */
export function renderPage(title: string, bodyHtml: string, head = ''): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)}</title>
${head}
<style>${STYLE}</style>
</head>
<body><main>${bodyHtml}</main></body>
</html>`;
}
