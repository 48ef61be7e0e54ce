import { render } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { cssContent, PrintPageMargins } from './PrintPageMargins';

describe('PrintPageMargins', () => {
  it('writes page numbers as counters and any other text as an escaped string', () => {
    expect(cssContent('Page {page} of {pages}')).toBe('"Page " counter(page) " of " counter(pages)');
    // A calc number is typed by people: quotes, braces and backslashes cannot end the rule.
    expect(cssContent('A"} body{x:1} \\')).toBe('"A\\22 \\7d  body\\7b x:1\\7d  \\5c "');
    expect(cssContent('σ 2 — rev.')).toBe('"\\3c3  2 — rev."');
  });

  it('puts each text in its margin box of the printed page', () => {
    const { container } = render(<PrintPageMargins topCenter="Not issued — draft" bottomRight="Page {page} of {pages}" />);
    const css = container.querySelector('style')?.textContent ?? '';
    expect(css).toMatch(/^@media print \{ @page \{ @top-center \{ content: "Not issued — draft"; .*\} @bottom-right \{ content: "Page " counter\(page\) " of " counter\(pages\); .*\} \} \}$/);
    expect(css).not.toContain('@bottom-left');
  });
});
