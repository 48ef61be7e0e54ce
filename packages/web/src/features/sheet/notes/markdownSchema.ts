import { defaultSchema, type Options as SanitizeSchema } from 'rehype-sanitize';

/**
 * The sanitizer's allow-list for notes: GitHub's defaults (no scripts, no event handlers, no
 * raw HTML beyond safe tags) plus the class names remark-math puts on math, so rehype-katex,
 * which runs after the sanitizer, still finds `$...$` and `$$...$$`.
 */
export const noteSanitizeSchema: SanitizeSchema = {
  ...defaultSchema,
  attributes: {
    ...defaultSchema.attributes,
    code: [['className', /^language-./, 'math-inline', 'math-display']],
    span: [...(defaultSchema.attributes?.span ?? []), ['className', 'math', 'math-inline', 'math-display']],
    div: [...(defaultSchema.attributes?.div ?? []), ['className', 'math', 'math-display']],
  },
};
