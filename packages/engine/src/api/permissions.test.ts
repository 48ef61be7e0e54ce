import { describe, expect, it } from 'vitest';
import { ROLES } from './common';
import { ACTIONS, can, canEditSheet, PERMISSIONS } from './permissions';

describe('permission table', () => {
  it('names only known actions for every role', () => {
    for (const role of ROLES) {
      for (const action of PERMISSIONS[role]) expect(ACTIONS).toContain(action);
    }
  });

  it('lets the owner do everything and the viewer only read', () => {
    expect(ACTIONS.filter((action) => !can('owner', action))).toEqual([]);
    expect(ACTIONS.filter((action) => can('viewer', action))).toEqual(['org.read', 'project.read', 'sheet.read', 'revision.read', 'template.read', 'material.read']);
  });

  it('lets engineers edit sheets but not checkers or viewers', () => {
    expect(ROLES.filter(canEditSheet)).toEqual(['owner', 'engineer']);
  });

  it('keeps approval with checkers and owners, and member management with owners', () => {
    expect(ROLES.filter((role) => can(role, 'sheet.approve'))).toEqual(['owner', 'checker']);
    expect(ROLES.filter((role) => can(role, 'org.manageMembers'))).toEqual(['owner']);
  });

  it('keeps the check workflow apart: engineers submit, checkers return and resolve, owners reassign', () => {
    expect(ROLES.filter((role) => can(role, 'sheet.submit'))).toEqual(['owner', 'engineer']);
    expect(ROLES.filter((role) => can(role, 'sheet.check'))).toEqual(['owner', 'checker']);
    expect(ROLES.filter((role) => can(role, 'sheet.return'))).toEqual(['owner', 'checker']);
    expect(ROLES.filter((role) => can(role, 'note.create'))).toEqual(['owner', 'engineer', 'checker']);
    expect(ROLES.filter((role) => can(role, 'note.resolve'))).toEqual(['owner', 'checker']);
    expect(ROLES.filter((role) => can(role, 'sheet.reassignChecker'))).toEqual(['owner']);
    expect(ROLES.filter((role) => can(role, 'revision.read'))).toEqual(['owner', 'engineer', 'checker', 'viewer']);
  });

  it('lets every member read templates and materials, and only owners and engineers write them', () => {
    expect(ROLES.filter((role) => can(role, 'template.read'))).toEqual(['owner', 'engineer', 'checker', 'viewer']);
    expect(ROLES.filter((role) => can(role, 'material.read'))).toEqual(['owner', 'engineer', 'checker', 'viewer']);
    expect(ROLES.filter((role) => can(role, 'template.write'))).toEqual(['owner', 'engineer']);
    expect(ROLES.filter((role) => can(role, 'material.write'))).toEqual(['owner', 'engineer']);
  });
});
