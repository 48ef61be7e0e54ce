import { createEvaluator, machineOutput, readSheet, type MachineOutput, type MaterialsLookup } from '@sheaf/engine';
import type { SheetContentV1 } from '@sheaf/engine/api';
import { conflict } from '../../http/ApiError';

/** A sheet's content in the engine's canonical form, with the results the server computed from it. */
export interface EvaluatedContent {
  content: SheetContentV1;
  results: MachineOutput;
}

/**
 * Reads a sheet's content with the engine's format reader and evaluates every cell on the server.
 * Results are never taken from a client: whatever a browser computed or sent, a revision holds
 * what the engine says here. Content the reader refuses cannot be issued: 409 naming each field.
 *
 * `materials`: for an issued revision its frozen materials (`frozenMaterialsLookup`), for the
 * sheet as it is now the organization's library (`materialsLookupFor`); cells that name a
 * material not in it get their `unknown-material` error value.
 */
export function evaluateOnServer(content: unknown, materials?: MaterialsLookup): EvaluatedContent {
  const read = readSheet(content);
  if (!read.ok) {
    throw conflict(`the sheet is not a valid sheet file and cannot be checked or issued: ${read.errors.map((e) => `content.${e}`).join('; ')}`);
  }
  const evaluator = createEvaluator({ cells: read.sheet.cells }, materials ? { materials } : {});
  return {
    content: read.sheet as unknown as SheetContentV1,
    results: machineOutput(read.sheet.cells, evaluator.results),
  };
}
