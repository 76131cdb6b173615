import { VisuallyHidden } from '@radix-ui/themes';

/**
 * The accessible name of a table, read by screen readers and found by tests
 * (Radix's Table.Root puts its own props on a wrapper, not on the <table>).
 */
export function TableCaption({ children }: { children: string }) {
  return (
    <VisuallyHidden asChild>
      <caption>{children}</caption>
    </VisuallyHidden>
  );
}
