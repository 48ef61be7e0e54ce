import { render } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { NoteMarkdown } from './NoteMarkdown';

describe('NoteMarkdown', () => {
  it('renders Markdown with inline and display math through KaTeX', () => {
    const { container } = render(
      <NoteMarkdown text={'Load case **LC2**: $F = 18\\,kN$ at 30°.\n\n$$\n\\sigma = \\frac{F}{A}\n$$'} />,
    );
    expect(container.querySelector('strong')?.textContent).toBe('LC2');
    expect(container.querySelectorAll('.katex').length).toBe(2);
    expect(container.querySelector('.katex-display')).not.toBeNull();
    expect(container.querySelector('annotation')?.textContent).toBe('F = 18\\,kN');
  });

  it('drops scripts, event handlers and javascript links', () => {
    const { container } = render(
      <NoteMarkdown text={'<script>alert(1)</script><img src="x" onerror="alert(2)"> [a](javascript:alert(3))'} />,
    );
    expect(container.querySelector('script')).toBeNull();
    expect(container.innerHTML).not.toMatch(/onerror|javascript:/);
  });

  it('shows macros that need trust as errors rather than links', () => {
    const { container } = render(<NoteMarkdown text={'$\\href{https://x.test}{x}$'} />);
    expect(container.querySelector('a')).toBeNull();
  });
});
