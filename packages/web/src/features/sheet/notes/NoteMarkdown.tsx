import ReactMarkdown from 'react-markdown';
import rehypeKatex from 'rehype-katex';
import rehypeSanitize from 'rehype-sanitize';
import remarkMath from 'remark-math';
import { KATEX_OPTIONS } from '../results/renderTex';
import { noteSanitizeSchema } from './markdownSchema';

const remarkPlugins = [remarkMath];
// Order matters: sanitize first (with the math class names allowed), then typeset. The other
// way round the sanitizer strips KaTeX's output; without it raw HTML could run.
const rehypePlugins = [
  [rehypeSanitize, noteSanitizeSchema],
  [rehypeKatex, KATEX_OPTIONS],
] as const;

/** A note's Markdown with `$...$` and `$$...$$` math, rendered safely. */
export function NoteMarkdown({ text }: { text: string }) {
  return (
    <div className="note-markdown">
      <ReactMarkdown
        remarkPlugins={remarkPlugins}
        rehypePlugins={rehypePlugins as unknown as NonNullable<Parameters<typeof ReactMarkdown>[0]['rehypePlugins']>}
        skipHtml={false}
      >
        {text}
      </ReactMarkdown>
    </div>
  );
}
