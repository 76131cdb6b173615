import { Callout } from '@radix-ui/themes';
import { ApiError } from '../api/client';

/** Says what went wrong and, where it can, what to try. */
export function ErrorNote({ error, action }: { error: unknown; action?: string }) {
  if (!error) return null;
  const message = error instanceof Error ? error.message : String(error);
  const hint = error instanceof ApiError && error.status === 0 ? '' : action ? ` ${action}` : '';
  return (
    <Callout.Root color="red" role="alert" size="1">
      <Callout.Text>
        {message.charAt(0).toUpperCase() + message.slice(1)}
        {hint}
      </Callout.Text>
    </Callout.Root>
  );
}
