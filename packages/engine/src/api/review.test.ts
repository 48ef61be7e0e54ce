import { describe, expect, it } from 'vitest';
import { CreateNoteRequest, NotesQuery } from './notes';
import { ApproveSheetRequest, ReturnSheetRequest, SubmitForCheckRequest } from './review';
import { DiffQuery, RevisionParams } from './revisions';

function messages(result: { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } }): string[] {
  return (result.error?.issues ?? []).map((issue) => `${issue.path.join('.')}: ${issue.message}`);
}

describe('review request shapes', () => {
  it('drops results a client sends with an approval: the server computes them', () => {
    const parsed = ApproveSheetRequest.parse({ overrideReason: ' Note 3 is a drawing matter ', results: { cells: { DE: { values: { factor: 9 } } } } });
    expect(parsed).toEqual({ overrideReason: 'Note 3 is a drawing matter' });
    expect(messages(ApproveSheetRequest.safeParse({ overrideReason: '   ' }))).toEqual(['overrideReason: must not be empty']);
  });

  it('names the field at fault in submit, return and note requests', () => {
    expect(messages(SubmitForCheckRequest.safeParse({ checkerUserId: 'Chandra' }))).toEqual([
      'checkerUserId: must be the id of a member who may check sheets',
    ]);
    expect(messages(ReturnSheetRequest.safeParse({ message: '' }))).toEqual(['message: must say what the preparer should fix']);
    expect(messages(CreateNoteRequest.safeParse({ cellId: 'c1', body: '  ' }))).toEqual(['body: must not be empty']);
  });

  it('reads revision numbers from paths and query strings', () => {
    expect(RevisionParams.parse({ sheetId: '4f4e1a52-98e5-4a4c-9d43-0c8d1f0f7b5e', number: '2' }).number).toBe(2);
    expect(RevisionParams.safeParse({ sheetId: '4f4e1a52-98e5-4a4c-9d43-0c8d1f0f7b5e', number: '0' }).success).toBe(false);
    expect(DiffQuery.parse({ from: '1', to: 'current' })).toEqual({ from: 1, to: 'current' });
    expect(DiffQuery.parse({ from: '1', to: '3' })).toEqual({ from: 1, to: 3 });
    expect(messages(DiffQuery.safeParse({ from: 'x', to: '2' }))[0]).toMatch(/^from: /);
    expect(NotesQuery.parse({})).toEqual({});
  });
});
