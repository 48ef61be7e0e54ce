// Types of databaseRoles.mjs for the TypeScript tests and tools.
export const OWNER_ROLE: string;
export const APP_ROLE: string;
export interface RoleOptions {
  owner?: string;
  app?: string;
  ownerPassword?: string;
  appPassword?: string;
}
export function roleSetupSql(database: string, options?: RoleOptions): { cluster: string[]; database: string[]; owner: string[] };
export function withDatabase(url: string, database: string, user?: string, password?: string): string;
export function setUpRoles(adminUrl: string, database: string, options?: RoleOptions): Promise<{ ownerUrl: string; appUrl: string }>;
