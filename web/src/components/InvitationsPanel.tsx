import { Button, Flex, Select, Table, Text, TextField } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { useInvitations } from '../api/invitations';
import { ErrorNote } from './ErrorNote';
import { formatWhen } from './dates';

/** Invite by e-mail with a role, and the pending invitations with revoke; for a group (admins) or a notebook (lead author). */
export function InvitationsPanel({ base, roles, defaultRole }: { base: string; roles: { value: string; label: string }[]; defaultRole: string }) {
  const { list, send, revoke } = useInvitations(base);
  const [email, setEmail] = useState('');
  const [role, setRole] = useState(defaultRole);
  async function submit(e: FormEvent) {
    e.preventDefault();
    await send.mutateAsync({ email, role }).then(() => setEmail(''), () => {});
  }
  const pending = list.data?.invitations ?? [];
  return (
    <Flex direction="column" gap="3">
      <form onSubmit={submit} aria-label="Invite by e-mail">
        <Flex gap="2" align="center" wrap="wrap">
          <TextField.Root type="email" required aria-label="E-mail to invite" placeholder="colleague@institute.example" value={email} onChange={(e) => setEmail(e.target.value)} style={{ minWidth: 280 }} />
          <Select.Root value={role} onValueChange={setRole}>
            <Select.Trigger aria-label="Role to invite as" />
            <Select.Content>
              {roles.map((r) => (
                <Select.Item key={r.value} value={r.value}>
                  {r.label}
                </Select.Item>
              ))}
            </Select.Content>
          </Select.Root>
          <Button type="submit" loading={send.isPending}>
            Send invitation
          </Button>
        </Flex>
        {send.data && (
          <Text as="p" size="2" color={send.data.mailSent ? 'green' : 'amber'} role="status" mt="1">
            {send.data.mailSent ? `Invitation sent to ${send.data.email}.` : send.data.mailError}
          </Text>
        )}
        <ErrorNote error={send.error} />
      </form>
      {pending.length > 0 && (
        <Table.Root aria-label="Pending invitations">
          <Table.Header>
            <Table.Row>
              <Table.ColumnHeaderCell>E-mail</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Role</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Expires</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell />
            </Table.Row>
          </Table.Header>
          <Table.Body>
            {pending.map((i) => (
              <Table.Row key={i.id}>
                <Table.Cell>{i.email}</Table.Cell>
                <Table.Cell>{roles.find((r) => r.value === i.role)?.label ?? i.role}</Table.Cell>
                <Table.Cell>{formatWhen(i.expiresAt)}</Table.Cell>
                <Table.Cell>
                  <Button size="1" variant="soft" color="red" aria-label={`Revoke the invitation to ${i.email}`} onClick={() => revoke.mutate(i.id)}>
                    Revoke
                  </Button>
                </Table.Cell>
              </Table.Row>
            ))}
          </Table.Body>
        </Table.Root>
      )}
      <ErrorNote error={revoke.error ?? list.error} />
    </Flex>
  );
}
