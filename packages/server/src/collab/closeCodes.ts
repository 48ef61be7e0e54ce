// The close codes are shared with the web client through @sheaf/sheet-doc.
export { COLLAB_CLOSE, COLLAB_CLOSE_REASON, isFinalCloseCode, type CollabCloseCode } from '@sheaf/sheet-doc';
