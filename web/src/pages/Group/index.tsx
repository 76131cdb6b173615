import { Badge, Button, Flex, Heading, Select, Table, Text, TextField } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { GROUP_ROLES, type GroupRole } from '@upwell/common';
import { useMe } from '../../api/auth';
import { useGroup, useGroupMembers } from '../../api/groups';
import { useCurrentGroup } from '../../current-group';
import { CreateGroupForm } from '../../components/CreateGroupForm';
import { EmptyState } from '../../components/EmptyState';
import { ErrorNote } from '../../components/ErrorNote';
import { PageTitle } from '../../components/PageTitle';
import { formatWhen } from '../../components/dates';
import { InvitationsPanel } from '../../components/InvitationsPanel';

const ROLE_WORDS: Record<GroupRole, string> = { admin: 'Admin', member: 'Member' };

function AddMemberForm({ groupId }: { groupId: string }) {
  const { add } = useGroupMembers(groupId);
  const [email, setEmail] = useState('');
  const [role, setRole] = useState<GroupRole>('member');
  async function submit(e: FormEvent) {
    e.preventDefault();
    await add.mutateAsync({ email, role }).then(() => setEmail(''), () => {});
  }
  return (
    <form onSubmit={submit} aria-label="Add a member">
      <Flex gap="2" align="center" wrap="wrap">
        <TextField.Root type="email" required aria-label="E-mail of the person to add" placeholder="colleague@institute.example" value={email} onChange={(e) => setEmail(e.target.value)} style={{ minWidth: 280 }} />
        <Select.Root value={role} onValueChange={(v) => setRole(v as GroupRole)}>
          <Select.Trigger aria-label="Group role" />
          <Select.Content>
            {GROUP_ROLES.map((r) => (
              <Select.Item key={r} value={r}>
                {ROLE_WORDS[r]}
              </Select.Item>
            ))}
          </Select.Content>
        </Select.Root>
        <Button type="submit" loading={add.isPending}>
          Add to group
        </Button>
      </Flex>
      <Text as="p" size="1" color="gray" mt="1">
        The person needs an Upwell account already.
      </Text>
      <ErrorNote error={add.error} />
    </form>
  );
}

/** The current group: its members and their roles; admins manage them. */
export default function GroupPage() {
  const { group } = useCurrentGroup();
  const me = useMe();
  const detail = useGroup(group?.id);
  const members = useGroupMembers(group?.id ?? '');

  if (!group) {
    return (
      <>
        <PageTitle title="Group" />
        <EmptyState title="You are not in a research group yet" action={<CreateGroupForm />}>
          Create a group for your team, or ask a colleague who runs one to add you with the e-mail of your account.
        </EmptyState>
      </>
    );
  }
  const managesMembers = detail.data?.allowed.includes('manage-members') ?? false;
  return (
    <>
      <PageTitle title={group.name} subtitle={detail.data ? `${detail.data.members.length} members · created ${formatWhen(detail.data.createdAt)}` : undefined} />
      <ErrorNote error={detail.error ?? members.changeRole.error ?? members.remove.error} />
      <Heading as="h2" size="4" mb="2">
        Members
      </Heading>
      <Table.Root variant="surface">
        <Table.Header>
          <Table.Row>
            <Table.ColumnHeaderCell>Name</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>E-mail</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>Group role</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>Member since</Table.ColumnHeaderCell>
            {managesMembers && <Table.ColumnHeaderCell />}
          </Table.Row>
        </Table.Header>
        <Table.Body>
          {(detail.data?.members ?? []).map((m) => (
            <Table.Row key={m.user.id}>
              <Table.RowHeaderCell>
                {m.user.name} {m.user.id === me.data?.id && <Badge variant="soft">you</Badge>}
              </Table.RowHeaderCell>
              <Table.Cell>{m.user.email}</Table.Cell>
              <Table.Cell>
                {managesMembers ? (
                  <Select.Root value={m.role} onValueChange={(v) => members.changeRole.mutate({ userId: m.user.id, role: v as GroupRole })} size="1">
                    <Select.Trigger aria-label={`Group role of ${m.user.name}`} />
                    <Select.Content>
                      {GROUP_ROLES.map((r) => (
                        <Select.Item key={r} value={r}>
                          {ROLE_WORDS[r]}
                        </Select.Item>
                      ))}
                    </Select.Content>
                  </Select.Root>
                ) : (
                  ROLE_WORDS[m.role]
                )}
              </Table.Cell>
              <Table.Cell>{formatWhen(m.since)}</Table.Cell>
              {managesMembers && (
                <Table.Cell>
                  {m.user.id !== me.data?.id && (
                    <Button size="1" variant="ghost" color="red" onClick={() => members.remove.mutate(m.user.id)} aria-label={`Remove ${m.user.name} from the group`}>
                      Remove
                    </Button>
                  )}
                </Table.Cell>
              )}
            </Table.Row>
          ))}
        </Table.Body>
      </Table.Root>
      {managesMembers && (
        <Flex direction="column" gap="2" mt="5">
          <Heading as="h2" size="4">
            Add a member
          </Heading>
          <AddMemberForm groupId={group.id} />
          <Heading as="h2" size="4" mt="4">
            Invite by e-mail
          </Heading>
          <InvitationsPanel base={`/groups/${group.id}`} roles={GROUP_ROLES.map((r) => ({ value: r, label: ROLE_WORDS[r] }))} defaultRole="member" />
        </Flex>
      )}
      <Flex direction="column" gap="2" mt="6">
        <Heading as="h2" size="4">
          Another group
        </Heading>
        <CreateGroupForm />
      </Flex>
    </>
  );
}
