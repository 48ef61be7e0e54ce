/** Templates in the browser: the gallery card, the new-sheet parameter form, save-as-template, versions. */
export { ParameterForm } from './ParameterForm';
export { ParameterTable } from './ParameterTable';
export { TemplateCard } from './TemplateCard';
export { TemplateSaveForm } from './TemplateSaveForm';
export type { SaveTarget, TemplateText } from './TemplateSaveForm';
export { TemplateVersions } from './TemplateVersions';
