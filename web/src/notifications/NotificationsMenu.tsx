import { Badge, Button, DropdownMenu, Text, VisuallyHidden } from '@radix-ui/themes';
import { Link } from 'react-router';
import { formatWhen } from '../components/dates';
import { useMarkNotificationsRead, useNotifications } from './api';

/** A small bell drawn in the interface's ink, so the menu needs no icon font. */
function Bell() {
  return (
    <svg width="16" height="16" viewBox="0 0 16 16" aria-hidden="true" focusable="false">
      <path d="M8 1.5a4 4 0 0 0-4 4v3L2.5 11h11L12 8.5v-3a4 4 0 0 0-4-4ZM6.5 12.5a1.5 1.5 0 0 0 3 0" fill="none" stroke="currentColor" strokeWidth="1.3" />
    </svg>
  );
}

/**
 * The app shell's notifications: a menu button with the unread count,
 * listing mentions newest first; choosing one marks it read and opens its notebook.
 */
export function NotificationsMenu() {
  const list = useNotifications();
  const mark = useMarkNotificationsRead();
  const unread = list.data?.unread ?? 0;
  const items = list.data?.items ?? [];
  return (
    <DropdownMenu.Root>
      <DropdownMenu.Trigger>
        <Button variant="ghost" color="gray" aria-label={unread ? `Notifications, ${unread} unread` : 'Notifications'}>
          <Bell />
          {unread > 0 && (
            <Badge color="teal" radius="full" aria-hidden="true">
              {unread}
            </Badge>
          )}
        </Button>
      </DropdownMenu.Trigger>
      <DropdownMenu.Content align="end" style={{ maxWidth: 360 }}>
        {items.length === 0 ? (
          <DropdownMenu.Label>Nothing yet. When someone mentions you in a note, it shows here.</DropdownMenu.Label>
        ) : (
          items.map((n) => (
            <DropdownMenu.Item key={n.id} asChild style={{ height: 'auto', paddingBlock: 6 }} onSelect={() => !n.read && mark.one.mutate(n.id)}>
              <Link to={`/notebooks/${n.notebookId}`}>
                <Text size="2" weight={n.read ? 'regular' : 'bold'} as="span">
                  {n.by.name} mentioned you in {n.notebookTitle}: “{n.excerpt}” <Text color="gray">{formatWhen(n.createdAt)}</Text>
                  {!n.read && <VisuallyHidden> (unread)</VisuallyHidden>}
                </Text>
              </Link>
            </DropdownMenu.Item>
          ))
        )}
        {unread > 0 && (
          <>
            <DropdownMenu.Separator />
            <DropdownMenu.Item onSelect={() => mark.all.mutate()}>Mark all read</DropdownMenu.Item>
          </>
        )}
      </DropdownMenu.Content>
    </DropdownMenu.Root>
  );
}
