import { AuditEvent } from './AuditEvent';
import { Identity } from './Identity';
import { Invitation } from './Invitation';
import { Membership } from './Membership';
import { Note } from './Note';
import { OrganizationMaterial } from './OrganizationMaterial';
import { Organization } from './Organization';
import { PasswordReset } from './PasswordReset';
import { Project } from './Project';
import { Revision } from './Revision';
import { Session } from './Session';
import { Sheet } from './Sheet';
import { SheetUpdate } from './SheetUpdate';
import { Template } from './Template';
import { TemplateVersion } from './TemplateVersion';
import { User } from './User';

/** Every entity, listed explicitly for the DataSource (no glob loading under tsx or Vitest). */
export const ENTITIES = [User, Identity, Session, Organization, Membership, Invitation, PasswordReset, Project, Sheet, SheetUpdate, AuditEvent, Revision, Note, OrganizationMaterial, Template, TemplateVersion];
