import { Flex, Text } from '@radix-ui/themes';
import { useEffect, useState } from 'react';
import type { SocketDocumentProvider } from '../../sync/socket-document-provider';

interface Person {
  id: string;
  name: string;
  color: string;
}

/** Who has this notebook open now, from the live presence of each connection (one entry per person). */
export function PresenceRow({ provider, meId }: { provider: SocketDocumentProvider | null; meId: string }) {
  const [people, setPeople] = useState<Person[]>([]);
  useEffect(() => {
    if (!provider) return;
    const read = () => {
      const seen = new Map<string, Person>();
      provider.awareness.getStates().forEach((state) => {
        const u = (state as { user?: Person }).user;
        if (u?.id && !seen.has(u.id)) seen.set(u.id, u);
      });
      setPeople([...seen.values()].sort((a, b) => (a.id === meId ? -1 : b.id === meId ? 1 : a.name.localeCompare(b.name))));
    };
    read();
    provider.awareness.on('change', read);
    return () => provider.awareness.off('change', read);
  }, [provider, meId]);
  if (!people.length) return null;
  return (
    <Flex gap="2" align="center" role="group" aria-label="Here now" wrap="wrap">
      <Text size="1" color="gray">
        Here now:
      </Text>
      {people.map((p) => (
        <Text key={p.id} size="1" weight="bold" style={{ borderBottom: `2px solid ${p.color}`, paddingBottom: 1 }}>
          {p.id === meId ? `${p.name} (you)` : p.name}
        </Text>
      ))}
    </Flex>
  );
}
