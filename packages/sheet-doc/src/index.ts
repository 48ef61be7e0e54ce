// The one entry of @sheaf/sheet-doc: the sheet's Yjs layout, its converters, and the close codes
// of the co-editing endpoint, shared by the server and the web client.
export * from './sheetDoc';
export * from './closeCodes';
