import { Box, Container, Flex, Select, Spinner, Text } from '@radix-ui/themes';
import { Navigate, NavLink, Outlet, useLocation } from 'react-router';
import { useMe } from '../api/auth';
import { useMailStatus } from '../api/invitations';
import { getToken } from '../api/client';
import { CurrentGroupProvider, useCurrentGroup } from '../current-group';
import { ErrorNote } from './ErrorNote';
import { NotificationsMenu } from '../notifications';

function GroupSwitcher() {
  const { group, groups, choose } = useCurrentGroup();
  if (!groups.length) return <Text size="2" color="gray">No group yet</Text>;
  return (
    <Select.Root value={group?.id} onValueChange={choose} size="2">
      <Select.Trigger variant="soft" aria-label="Research group" />
      <Select.Content>
        {groups.map((g) => (
          <Select.Item key={g.id} value={g.id}>
            {g.name}
          </Select.Item>
        ))}
      </Select.Content>
    </Select.Root>
  );
}

/** The frame around every signed-in page: wordmark, group, navigation. */
export function AppShell() {
  const me = useMe();
  const groupAdmin = me.data?.groups.some((g) => g.allowed.includes('read-mail')) ?? false;
  const mailStatus = useMailStatus(groupAdmin);
  const location = useLocation();
  if (!getToken() || me.error) {
    if (me.error && !(me.error as { status?: number }).status) return <ErrorNote error={me.error} action="Reload the page to try again." />;
    return <Navigate to="/sign-in" replace state={{ from: location.pathname }} />;
  }
  if (!me.data) {
    return (
      <Flex minHeight="60vh" align="center" justify="center">
        <Spinner size="3" />
      </Flex>
    );
  }
  return (
    <CurrentGroupProvider>
      <Box className="upwell-masthead" px="5" py="3">
        <Flex align="center" gap="5" wrap="wrap">
          <NavLink to="/notebooks" className="upwell-wordmark" aria-label="Upwell home">
            <Text size="5">Upwell</Text>
          </NavLink>
          <GroupSwitcher />
          <nav aria-label="Main" className="upwell-nav">
            <Flex gap="4">
              <NavLink to="/notebooks">Notebooks</NavLink>
              <NavLink to="/series">Series library</NavLink>
              <NavLink to="/group">Group</NavLink>
              <NavLink to="/account">Account</NavLink>
              {groupAdmin && mailStatus.data?.fake && <NavLink to="/mail">Mail outbox</NavLink>}
            </Flex>
          </nav>
          <Box flexGrow="1" />
          <NotificationsMenu />
          <Text size="2" color="gray">
            {me.data.name}
          </Text>
        </Flex>
      </Box>
      <Container size="4" px="5" py="6">
        <main>
          <Outlet />
        </main>
      </Container>
    </CurrentGroupProvider>
  );
}
