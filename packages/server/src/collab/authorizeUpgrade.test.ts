import { describe, expect, it } from 'vitest';
import { collabSheetIdOf, originChecker } from './authorizeUpgrade';

describe('collabSheetIdOf', () => {
  it('read the sheet id of the collab path, with or without a query or a trailing slash', () => {
    const id = '5f0c6a52-8a5e-4d8e-9a51-2b8f0f6f3c11';
    expect(collabSheetIdOf(`/collab/${id}`)).toBe(id);
    expect(collabSheetIdOf(`/collab/${id}/`)).toBe(id);
    expect(collabSheetIdOf(`/collab/${id}?v=1`)).toBe(id);
  });

  it('give null for any other path', () => {
    for (const path of ['/', '/collab', '/collab/', '/collab/a/b', '/api/collab/x', '/collabx/y', undefined]) {
      expect(collabSheetIdOf(path)).toBeNull();
    }
  });
});

describe('originChecker', () => {
  it('allow only the public origin in production', () => {
    const allowed = originChecker('https://sheaf.example.com', true);
    expect(allowed('https://sheaf.example.com')).toBe(true);
    expect(allowed('http://sheaf.example.com')).toBe(false);
    expect(allowed('https://evil.example.com')).toBe(false);
    expect(allowed('http://localhost:5173')).toBe(false);
    expect(allowed('null')).toBe(false);
  });

  it('also allow pages served from this machine outside production', () => {
    const allowed = originChecker('http://localhost:3000', false);
    expect(allowed('http://localhost:3000')).toBe(true);
    expect(allowed('http://localhost:5173')).toBe(true);
    expect(allowed('http://127.0.0.1:41234')).toBe(true);
    expect(allowed('http://[::1]:8080')).toBe(true);
    expect(allowed('https://localhost.evil.example')).toBe(false);
    expect(allowed('file://localhost')).toBe(false);
    expect(allowed('null')).toBe(false);
  });
});
