/** Cell kinds of sheet format version 1, as stored in files. @public */
export const KIND_IDS = ['note', 'quantity', 'stress', 'rosette', 'rotate', 'principal', 'criterion', 'pointset'] as const;

/** A cell kind id. @public */
export type KindId = (typeof KIND_IDS)[number];

/** True when `id` names a cell kind. @public */
export function isKindId(id: unknown): id is KindId {
  return typeof id === 'string' && (KIND_IDS as readonly string[]).includes(id);
}

/** Kinds whose result can be referred to as a stress state (`of`). @public */
export const STATE_KINDS: readonly KindId[] = ['stress', 'rosette', 'rotate', 'principal'];
