import type { Signatures as ReviewSignatures } from '@sheaf/engine/api';
import { useReviewState } from '../../api/review';
import type { Signatures } from '../../components/TitleBlock';

/** The title block's prepared / checked / approved boxes from signatures of the check workflow. */
export function toTitleBlockSignatures(signatures: ReviewSignatures | undefined): Signatures {
  const box = (signature: ReviewSignatures['prepared'] | undefined) => (signature ? { name: signature.user.name, at: signature.at } : null);
  return { prepared: box(signatures?.prepared), checked: box(signatures?.checked), approved: box(signatures?.approved) };
}

/** Signatures of the sheet's current revision, for its title block (empty while loading). */
export function useTitleBlockSignatures(sheetId: string): Signatures {
  const review = useReviewState(sheetId);
  return toTitleBlockSignatures(review.data?.signatures);
}
