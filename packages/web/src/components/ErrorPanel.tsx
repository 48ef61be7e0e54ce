import { describeError, isApiError } from '../api/ApiError';
import { FormAlert } from './FormAlert';

/** A failed request shown where its data would have been: what failed and what the server said. */
export function ErrorPanel({ error, what }: { error: unknown; what: string }) {
  const status = isApiError(error) && error.status > 0 ? ` (${error.status} ${error.code})` : '';
  return (
    <FormAlert title={`Could not load ${what}${status}`}>
      <p>{describeError(error)}</p>
    </FormAlert>
  );
}
