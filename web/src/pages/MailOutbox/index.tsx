import { Card, Flex, Heading, Text } from '@radix-ui/themes';
import { useMailOutbox } from '../../api/invitations';
import { EmptyState } from '../../components/EmptyState';
import { ErrorNote } from '../../components/ErrorNote';
import { PageTitle } from '../../components/PageTitle';
import { formatWhen } from '../../components/dates';

/**
 * Mail the local mailbox received (only while no SMTP server is configured),
 * for the groups the person administers and to the person themselves (secret links
 * hidden from all but the addressee, by the server). Bodies are shown as text; HTML only in a
 * sandboxed frame, never in the page.
 */
export default function MailOutboxPage() {
  const outbox = useMailOutbox();
  const messages = outbox.data?.messages ?? [];
  return (
    <>
      <PageTitle title="Mail outbox" />
      <Text as="p" size="2" color="gray" mb="4">
        No SMTP server is configured, so Upwell keeps the mail it sends here instead of delivering it. An invitation's
        link is shown only to the person it was sent to; everyone else sees that the mail went.
      </Text>
      <ErrorNote error={outbox.error} />
      {outbox.data && messages.length === 0 && <EmptyState title="No mail yet">Invitations and notifications about your groups will show up here.</EmptyState>}
      <Flex direction="column" gap="3">
        {messages.map((m) => (
          <Card key={m.id} asChild>
            <article aria-label={m.subject}>
              <Heading as="h2" size="3">
                {m.subject}
              </Heading>
              <Text as="p" size="2" color="gray">
                To {m.to.join(', ')} · {formatWhen(m.receivedAt)}
              </Text>
              <pre style={{ whiteSpace: 'pre-wrap', fontFamily: 'inherit', margin: '8px 0 0' }}>{m.text}</pre>
            </article>
          </Card>
        ))}
      </Flex>
    </>
  );
}
