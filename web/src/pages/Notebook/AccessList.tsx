import { InvitationsPanel } from '../../components/InvitationsPanel';
import { Button, Flex, Heading, Select, Table, Text } from '@radix-ui/themes';
import { useState } from 'react';
import { INVITABLE_NOTEBOOK_ROLES, NOTEBOOK_ROLE_LABELS, NOTEBOOK_ROLES, type NotebookRole, type NotebookView } from '@upwell/common';
import { useGroup } from '../../api/groups';
import { useNotebookRoles } from '../../api/notebooks';
import { ErrorNote } from '../../components/ErrorNote';

function RoleSelect({ value, onChange, label }: { value: NotebookRole; onChange: (r: NotebookRole) => void; label: string }) {
  return (
    <Select.Root value={value} onValueChange={(v) => onChange(v as NotebookRole)} size="1">
      <Select.Trigger aria-label={label} />
      <Select.Content>
        {NOTEBOOK_ROLES.map((r) => (
          <Select.Item key={r} value={r}>
            {NOTEBOOK_ROLE_LABELS[r]}
          </Select.Item>
        ))}
      </Select.Content>
    </Select.Root>
  );
}

/** Who holds which role on the notebook; the lead author can change it. */
export function AccessList({ notebook }: { notebook: NotebookView }) {
  const roles = useNotebookRoles(notebook.id);
  const group = useGroup(notebook.groupId);
  const manage = notebook.allowed.includes('manage-access');
  const [newPerson, setNewPerson] = useState<string>('');
  const [newRole, setNewRole] = useState<NotebookRole>('co-author');
  const holders = new Set((roles.list.data ?? []).map((r) => r.user.id));
  const candidates = (group.data?.members ?? []).filter((m) => !holders.has(m.user.id));

  return (
    <section aria-labelledby="access-heading">
      <Heading as="h2" size="4" id="access-heading" mb="2">
        People on this notebook
      </Heading>
      <Text as="p" size="2" color="gray" mb="3">
        Lead author: owns the notebook, manages access and publishes. Co-authors edit. Reviewers read and comment. Readers read.
      </Text>
      <ErrorNote error={roles.list.error ?? roles.assign.error ?? roles.remove.error} />
      <Table.Root variant="surface" size="1">
        <Table.Header>
          <Table.Row>
            <Table.ColumnHeaderCell>Person</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>Role</Table.ColumnHeaderCell>
            {manage && <Table.ColumnHeaderCell />}
          </Table.Row>
        </Table.Header>
        <Table.Body>
          {(roles.list.data ?? []).map((r) => (
            <Table.Row key={r.user.id}>
              <Table.RowHeaderCell>
                {r.user.name} <Text color="gray" size="1">{r.user.email}</Text>
              </Table.RowHeaderCell>
              <Table.Cell>
                {manage && r.role !== 'lead-author' ? (
                  <RoleSelect
                    value={r.role}
                    label={`Role of ${r.user.name}`}
                    onChange={(role) => roles.assign.mutate({ userId: r.user.id, role })}
                  />
                ) : (
                  NOTEBOOK_ROLE_LABELS[r.role]
                )}
              </Table.Cell>
              {manage && (
                <Table.Cell>
                  {r.role !== 'lead-author' && (
                    <Button size="1" variant="ghost" color="red" onClick={() => roles.remove.mutate(r.user.id)} aria-label={`Remove ${r.user.name}`}>
                      Remove
                    </Button>
                  )}
                </Table.Cell>
              )}
            </Table.Row>
          ))}
        </Table.Body>
      </Table.Root>
      {manage && (
        <Flex gap="2" mt="3" align="center" wrap="wrap">
          {candidates.length === 0 ? (
            <Text size="2" color="gray">
              Everyone in the group already has a role here. Add people to the group on the Group page first.
            </Text>
          ) : (
            <>
              <Select.Root value={newPerson} onValueChange={setNewPerson} size="2">
                <Select.Trigger placeholder="Choose a group member" aria-label="Group member to add" />
                <Select.Content>
                  {candidates.map((m) => (
                    <Select.Item key={m.user.id} value={m.user.id}>
                      {m.user.name}
                    </Select.Item>
                  ))}
                </Select.Content>
              </Select.Root>
              <RoleSelect value={newRole} onChange={setNewRole} label="Role to give" />
              <Button
                disabled={!newPerson}
                loading={roles.assign.isPending}
                onClick={() => roles.assign.mutate({ userId: newPerson, role: newRole }, { onSuccess: () => setNewPerson('') })}
              >
                Give role
              </Button>
            </>
          )}
        </Flex>
      )}
      {manage && (
        <Flex direction="column" gap="2" mt="4">
          <Heading as="h3" size="3">
            Invite by e-mail
          </Heading>
          <InvitationsPanel
            base={`/notebooks/${notebook.id}`}
            roles={INVITABLE_NOTEBOOK_ROLES.map((r) => ({ value: r, label: NOTEBOOK_ROLE_LABELS[r] }))}
            defaultRole="reviewer"
          />
        </Flex>
      )}
    </section>
  );
}
