import { useMemo } from 'react';
import { renderTex } from './renderTex';

/**
 * Typeset LaTeX with KaTeX. The HTML comes from KaTeX itself with `trust: false`, so it holds no
 * links, scripts or raw HTML from the source text.
 */
export function TexView({
  latex,
  display = false,
  className = '',
  label,
}: {
  latex: string;
  display?: boolean;
  className?: string;
  /** Plain-text name for the formula's container, e.g. "Equation of S". */
  label?: string;
}) {
  const html = useMemo(() => renderTex(latex, display), [latex, display]);
  const Tag = display ? 'div' : 'span';
  return (
    <Tag
      className={className}
      role={label ? 'group' : undefined}
      aria-label={label}
      data-latex={latex}
      dangerouslySetInnerHTML={{ __html: html }}
    />
  );
}
