import { Button, Card, Flex, Heading, Text, TextField } from '@radix-ui/themes';
import { NOTEBOOK_ROLE_LABELS, type NotebookRole } from '@upwell/common';
import { useState, type FormEvent } from 'react';
import { useNavigate, useParams } from 'react-router';
import { useMe } from '../../api/auth';
import { ApiError } from '../../api/client';
import { useAcceptInvitation, useInvitationPreview } from '../../api/invitations';
import { AuthFrame } from '../../components/AuthFrame';
import { ErrorNote } from '../../components/ErrorNote';

/** The page an invitation mail links to: shows the invitation, then accepts it by signing up, signing in or as the signed-in person. */
export default function InvitationPage() {
  const { token = '' } = useParams();
  const preview = useInvitationPreview(token);
  const me = useMe();
  const accept = useAcceptInvitation(token);
  const navigate = useNavigate();
  const [name, setName] = useState('');
  const [password, setPassword] = useState('');

  if (preview.isPending) return <AuthFrame><Text>Opening the invitation…</Text></AuthFrame>;
  if (preview.error) {
    const status = preview.error instanceof ApiError ? preview.error.status : 0;
    return (
      <AuthFrame>
        <Card size="4">
          <Heading as="h1" size="6" mb="3">
            {status === 410 ? 'This invitation no longer works' : status === 404 ? 'No such invitation' : 'The invitation could not be opened'}
          </Heading>
          <Text as="p">{preview.error.message}</Text>
        </Card>
      </AuthFrame>
    );
  }
  const inv = preview.data;
  const role = inv.kind === 'notebook' ? NOTEBOOK_ROLE_LABELS[inv.role as NotebookRole].toLowerCase() : `group ${inv.role}`;
  const place = inv.notebookTitle ? `the notebook “${inv.notebookTitle}” of ${inv.groupName}` : `the research group ${inv.groupName}`;
  const signedIn = me.data ?? null;

  async function submit(e: FormEvent) {
    e.preventDefault();
    const body = signedIn ? {} : inv.accountExists ? { password } : { name, password };
    await accept.mutateAsync(body).then(
      (res) => navigate(res.granted.notebookId ? `/notebooks/${res.granted.notebookId}` : '/group', { replace: true }),
      () => {},
    );
  }

  return (
    <AuthFrame>
      <Card size="4">
        <form onSubmit={submit} aria-label="Accept the invitation">
          <Flex direction="column" gap="4">
            <Heading as="h1" size="6">
              Invitation to {inv.notebookTitle ?? inv.groupName}
            </Heading>
            <Text as="p">
              {inv.invitedBy?.name ?? 'Someone'} invites {inv.email} to {place}, as {role}. The link works until{' '}
              {new Date(inv.expiresAt).toLocaleString()}.
            </Text>
            {!signedIn && !inv.accountExists && (
              <label>
                <Text as="div" size="2" weight="bold" mb="1">
                  Your name
                </Text>
                <TextField.Root autoComplete="name" required value={name} onChange={(e) => setName(e.target.value)} />
              </label>
            )}
            {!signedIn && (
              <label>
                <Text as="div" size="2" weight="bold" mb="1">
                  {inv.accountExists ? 'Password' : 'Choose a password'}
                </Text>
                <TextField.Root
                  type="password"
                  autoComplete={inv.accountExists ? 'current-password' : 'new-password'}
                  required
                  value={password}
                  onChange={(e) => setPassword(e.target.value)}
                />
              </label>
            )}
            <ErrorNote error={accept.error} />
            <Button type="submit" size="3" loading={accept.isPending}>
              {signedIn ? `Accept as ${signedIn.name}` : inv.accountExists ? 'Sign in and accept' : 'Create account and accept'}
            </Button>
          </Flex>
        </form>
      </Card>
    </AuthFrame>
  );
}
