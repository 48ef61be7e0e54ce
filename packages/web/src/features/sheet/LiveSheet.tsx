import { docFromSheetContent, type SheetFileContent } from '@sheaf/sheet-doc';
import { useMemo } from 'react';
import { can, type Role, type SheetDetail } from '../../api/types';
import { isConnectionUsable } from '../../collab/connectionState';
import { useSheetDoc } from '../../collab/useSheetDoc';
import { useProjectOrganization } from '../../hooks/useProjectOrganization';
import { useMaterialsLookup } from '../materials/useMaterialsLookup';
import { ConnectionBanner } from './ConnectionBanner';
import { SheetEditor } from './SheetEditor';

/**
 * The sheet's cells, live. Until the shared document arrives over the websocket, the sheet as
 * last saved is shown read-only and already evaluated (so the first results do not wait for
 * the connection); then the live copy takes over, editable for owners and engineers. When the
 * server ends the connection for good (signed out, no access) the sheet turns read-only, so
 * nothing is typed that could not be kept.
 */
export function LiveSheet({ sheet, role, selfName }: { sheet: SheetDetail; role: Role; selfName: string }) {
  const handle = useSheetDoc(sheet.id);
  const owner = useProjectOrganization(sheet.projectId);
  const materials = useMaterialsLookup(owner?.organization.id ?? '');
  const saved = useMemo(() => docFromSheetContent(sheet.content as SheetFileContent), [sheet.content]);
  const canEdit = can(role, 'sheet.edit');
  const live = handle.synced && handle.doc !== null;
  const doc = live && handle.doc ? handle.doc : saved;
  const readOnly = !live || !canEdit || !isConnectionUsable(handle.state);

  return (
    <div data-live={live ? 'true' : 'false'}>
      <ConnectionBanner state={handle.state} readOnly={!canEdit} />
      <SheetEditor
        key={live ? 'live' : 'saved'}
        doc={doc}
        awareness={live ? handle.awareness : null}
        readOnly={readOnly}
        selfName={selfName}
        fileStem={sheet.calcNumber || sheet.title}
        organizationId={owner?.organization.id ?? null}
        materials={materials}
      />
    </div>
  );
}
