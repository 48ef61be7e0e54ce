import { z } from 'zod';
import { DisplayName, Id, Timestamp } from './common';

/** A project code: what calc numbers start with, e.g. `GBL` gives `GBL-001`. */
export const ProjectCode = z
  .string({ error: 'must be a string' })
  .trim()
  .toUpperCase()
  .regex(/^[A-Z0-9][A-Z0-9-]{0,14}[A-Z0-9]$/, {
    error: 'must be 2 to 16 letters, digits or hyphens, starting and ending with a letter or digit',
  });

export const Project = z
  .object({ id: Id, name: z.string(), code: z.string(), createdAt: Timestamp, sheetCount: z.number().int() })
  .meta({ id: 'Project' });
export type Project = z.infer<typeof Project>;

export const ProjectListResponse = z.object({ projects: z.array(Project) }).meta({ id: 'ProjectListResponse' });
export type ProjectListResponse = z.infer<typeof ProjectListResponse>;

export const CreateProjectRequest = z
  .object({ name: DisplayName, code: ProjectCode.optional() })
  .meta({ id: 'CreateProjectRequest' });
export type CreateProjectRequest = z.infer<typeof CreateProjectRequest>;

export const ProjectResponse = z.object({ project: Project }).meta({ id: 'ProjectResponse' });
export type ProjectResponse = z.infer<typeof ProjectResponse>;
