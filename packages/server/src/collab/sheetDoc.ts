// The sheet's Yjs layout lives in @sheaf/sheet-doc so the web app uses the very same code.
export * from '@sheaf/sheet-doc';
