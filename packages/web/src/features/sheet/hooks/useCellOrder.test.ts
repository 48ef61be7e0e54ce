import { cellText, docFromSheetContent, sheetOrder } from '@sheaf/sheet-doc';
import { act, renderHook } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import * as Y from 'yjs';
import { addCell, deleteCell, moveCellBy } from '../doc/cellActions';
import { useCellOrder } from './useCellOrder';

function sheet() {
  return docFromSheetContent({
    format: 'sheaf-sheet',
    version: 1,
    cells: [
      { id: 'a', kind: 'note', text: 'one' },
      { id: 'b', kind: 'quantity', name: 'load', expr: '18 kN' },
      { id: 'c', kind: 'quantity', name: 'area', expr: '480 mm^2' },
    ],
  });
}

describe('useCellOrder', () => {
  it('follows cells moved, added and deleted, here or in another copy', () => {
    const doc = sheet();
    const { result } = renderHook(() => useCellOrder(doc));
    expect(result.current).toEqual(['a', 'b', 'c']);

    act(() => void moveCellBy(doc, 'c', -2));
    expect(result.current).toEqual(['c', 'a', 'b']);

    let added = '';
    act(() => {
      added = addCell(doc, 'stress', 1);
    });
    expect(result.current).toEqual(['c', added, 'a', 'b']);

    const remote = new Y.Doc();
    Y.applyUpdate(remote, Y.encodeStateAsUpdate(doc));
    deleteCell(remote, 'a');
    act(() => Y.applyUpdate(doc, Y.encodeStateAsUpdate(remote, Y.encodeStateVector(doc))));
    expect(result.current).toEqual(['c', added, 'b']);
  });

  it('keeps the same array while only text changes, so the list does not re-render on typing', () => {
    const doc = sheet();
    const { result } = renderHook(() => useCellOrder(doc));
    const before = result.current;
    act(() => cellText(doc, 'b', 'expr')!.insert(0, '2 * '));
    expect(result.current).toBe(before);
  });

  it('reads a cell listed twice once, at its first place', () => {
    const doc = sheet();
    const { result } = renderHook(() => useCellOrder(doc));
    act(() => sheetOrder(doc).push(['a']));
    expect(result.current).toEqual(['a', 'b', 'c']);
  });
});
