import { Button, Card, DataList, Flex, Heading, Switch, Text, TextField } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router';
import { LIMITS } from '@upwell/common';
import { useLogout, useMe, useUpdateMe } from '../../api/auth';
import { ErrorNote } from '../../components/ErrorNote';
import { PageTitle } from '../../components/PageTitle';
import { formatWhen } from '../../components/dates';

/** The person's own account: name, e-mail, groups, sign-out. */
export default function AccountPage() {
  const me = useMe();
  const update = useUpdateMe();
  const logout = useLogout();
  const navigate = useNavigate();
  const [name, setName] = useState(me.data?.name ?? '');
  if (!me.data) return null;

  async function submit(e: FormEvent) {
    e.preventDefault();
    await update.mutateAsync({ name }).catch(() => {});
  }

  return (
    <>
      <PageTitle title="Account" />
      <Flex direction="column" gap="5" maxWidth="560px">
        <Card size="3">
          <DataList.Root>
            <DataList.Item>
              <DataList.Label>E-mail</DataList.Label>
              <DataList.Value>{me.data.email}</DataList.Value>
            </DataList.Item>
            <DataList.Item>
              <DataList.Label>Account since</DataList.Label>
              <DataList.Value>{formatWhen(me.data.createdAt)}</DataList.Value>
            </DataList.Item>
            <DataList.Item>
              <DataList.Label>Groups</DataList.Label>
              <DataList.Value>{me.data.groups.map((g) => `${g.name} (${g.role})`).join(', ') || 'none yet'}</DataList.Value>
            </DataList.Item>
          </DataList.Root>
        </Card>
        <form onSubmit={submit} aria-label="Display name">
          <Heading as="h2" size="4" mb="2">
            Display name
          </Heading>
          <Flex gap="2">
            <TextField.Root aria-label="Display name" required maxLength={LIMITS.nameMax} value={name} onChange={(e) => setName(e.target.value)} style={{ minWidth: 300 }} />
            <Button type="submit" loading={update.isPending}>
              Save name
            </Button>
          </Flex>
          {update.isSuccess && (
            <Text size="2" color="green" role="status">
              Saved.
            </Text>
          )}
          <ErrorNote error={update.error} />
        </form>
        <div>
          <Heading as="h2" size="4" mb="2">
            Notification mail
          </Heading>
          <Text as="label" size="2">
            <Flex gap="2" align="center">
              <Switch
                aria-label="Notification mail"
                checked={me.data.emailNotifications}
                disabled={update.isPending}
                onCheckedChange={(on) => update.mutate({ emailNotifications: on })}
              />
              Mail me when a snapshot is published or someone mentions me. Invitations are always sent.
            </Flex>
          </Text>
        </div>
        <div>
          <Heading as="h2" size="4" mb="2">
            Sign out
          </Heading>
          <Text as="p" size="2" color="gray" mb="2">
            Signs you out on every device at once.
          </Text>
          <Button variant="soft" color="gray" onClick={() => logout.mutate(undefined, { onSettled: () => navigate('/sign-in') })}>
            Sign out everywhere
          </Button>
        </div>
      </Flex>
    </>
  );
}
