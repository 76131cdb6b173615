import { Badge, Button, Callout, Flex, Heading, Table, Text, TextField } from '@radix-ui/themes';
import { useId, useState, type FormEvent } from 'react';
import type { ShareLinkCreated, ShareLinkView, SnapshotSummary } from '@upwell/common';
import { useShareLinks } from '../../api/snapshots';
import { ErrorNote } from '../../components/ErrorNote';
import { TableCaption } from '../../components/TableCaption';
import { formatWhen } from '../../components/dates';

const STATE_WORDS: Record<ShareLinkView['state'], string> = { active: 'Active', expired: 'Expired', revoked: 'Revoked' };

/** The end of the chosen day in the person's time zone, as the ISO instant the server expects. */
export function endOfDayIso(date: string): string {
  const [y, m, d] = date.split('-').map(Number);
  return new Date(y, m - 1, d, 23, 59, 59).toISOString();
}

const today = () => {
  const t = new Date();
  return `${t.getFullYear()}-${String(t.getMonth() + 1).padStart(2, '0')}-${String(t.getDate()).padStart(2, '0')}`;
};

/** The token of a link just made: shown here once, never again. */
function NewLink({ link, onDone }: { link: ShareLinkCreated; onDone: () => void }) {
  const url = `${window.location.origin}${link.url}`;
  const [copied, setCopied] = useState<'yes' | 'failed' | null>(null);
  const copy = () =>
    navigator.clipboard?.writeText(url).then(
      () => setCopied('yes'),
      () => setCopied('failed'),
    ) ?? setCopied('failed');
  return (
    <Callout.Root color="amber" size="1" role="region" aria-label="New share link">
      <Callout.Text>
        <strong>Copy it now, it is shown once.</strong> Upwell keeps only a fingerprint of this link, so it cannot show it again; if it is
        lost, make a new one and revoke this one.
      </Callout.Text>
      <Flex gap="2" align="center" wrap="wrap" mt="2">
        <TextField.Root readOnly value={url} aria-label="New share link address" style={{ minWidth: 420 }} onFocus={(e) => e.currentTarget.select()} className="upwell-mono" />
        <Button size="1" onClick={copy}>
          Copy link
        </Button>
        <Button size="1" variant="soft" color="gray" onClick={onDone}>
          I have copied it
        </Button>
        {copied && (
          <Text size="1" role="status">
            {copied === 'yes' ? 'Copied.' : 'The browser refused to copy; select the address and copy it by hand.'}
          </Text>
        )}
      </Flex>
    </Callout.Root>
  );
}

/** Public links to one snapshot (lead author): make one with an optional expiry, see each link's state, revoke. */
export function ShareLinksPanel({ snapshot }: { snapshot: SnapshotSummary }) {
  const { list, create, revoke } = useShareLinks(snapshot.id);
  const [expires, setExpires] = useState('');
  const [created, setCreated] = useState<ShareLinkCreated | null>(null);
  const dateId = useId();
  const submit = (e: FormEvent) => {
    e.preventDefault();
    create.mutate({ expiresAt: expires ? endOfDayIso(expires) : null }, { onSuccess: (link) => (setCreated(link), setExpires('')) });
  };
  const links = list.data ?? [];
  return (
    <section aria-labelledby={`share-${snapshot.id}`} className="upwell-share-links">
      <Heading as="h3" size="3" id={`share-${snapshot.id}`} mb="1">
        Share links of v{snapshot.number}
      </Heading>
      <Text as="p" size="2" color="gray" mb="2">
        Anyone with a share link can read this snapshot without signing in; they see nothing else of the notebook. Revoke a link to close it.
      </Text>
      <form onSubmit={submit} aria-label={`Create a share link for v${snapshot.number}`}>
        <Flex gap="3" align="end" wrap="wrap" mb="2">
          <div className="upwell-field">
            <label htmlFor={dateId}>Expires after (optional)</label>
            <input id={dateId} type="date" min={today()} value={expires} onChange={(e) => setExpires(e.target.value)} />
          </div>
          <Button type="submit" loading={create.isPending}>
            Create share link
          </Button>
        </Flex>
      </form>
      <ErrorNote error={create.error ?? revoke.error ?? list.error} />
      {created && <NewLink link={created} onDone={() => setCreated(null)} />}
      {links.length === 0 ? (
        <Text as="p" size="2" color="gray" mt="2">
          No share links yet.
        </Text>
      ) : (
        <Table.Root size="1" variant="surface" mt="2">
          <TableCaption>{`Share links of snapshot v${snapshot.number}`}</TableCaption>
          <Table.Header>
            <Table.Row>
              <Table.ColumnHeaderCell>Link</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Made</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Expires</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>State</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell />
            </Table.Row>
          </Table.Header>
          <Table.Body>
            {links.map((l) => (
              <Table.Row key={l.id}>
                <Table.RowHeaderCell>
                  ending <span className="upwell-mono">…{l.tokenHint}</span>
                </Table.RowHeaderCell>
                <Table.Cell>
                  {formatWhen(l.createdAt)}
                  {l.createdBy ? ` by ${l.createdBy.name}` : ''}
                </Table.Cell>
                <Table.Cell>{l.expiresAt ? formatWhen(l.expiresAt) : 'never'}</Table.Cell>
                <Table.Cell>
                  <Badge variant="soft" color={l.state === 'active' ? 'teal' : 'gray'}>
                    {STATE_WORDS[l.state]}
                  </Badge>
                  {l.revokedAt && <Text size="1" color="gray">{` ${formatWhen(l.revokedAt)}`}</Text>}
                </Table.Cell>
                <Table.Cell>
                  {l.state === 'active' && (
                    <Button size="1" variant="soft" color="red" loading={revoke.isPending && revoke.variables === l.id} onClick={() => revoke.mutate(l.id)} aria-label={`Revoke the link ending ${l.tokenHint}`}>
                      Revoke
                    </Button>
                  )}
                </Table.Cell>
              </Table.Row>
            ))}
          </Table.Body>
        </Table.Root>
      )}
    </section>
  );
}
