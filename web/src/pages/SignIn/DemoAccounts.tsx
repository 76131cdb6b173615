import { Button, Card, Flex, Heading, Text } from '@radix-ui/themes';
import { NOTEBOOK_ROLE_LABELS, type DemoPerson } from '@upwell/common';
import { useDemoInfo } from '../../api/demo';

/** The demo's accounts, each filling the form in one click; shown only while the server runs the demo seed. */
export function DemoAccounts({ onPick }: { onPick: (person: DemoPerson) => void }) {
  const demo = useDemoInfo();
  if (!demo.data) return null;
  return (
    <Card size="3" mt="4" aria-labelledby="demo-accounts-heading">
      <Flex direction="column" gap="3">
        <Heading as="h2" size="4" id="demo-accounts-heading">
          Demo accounts
        </Heading>
        <Text size="2" color="gray">
          This server runs the demo: {demo.data.groupName}, with invented model output. Pick a role to fill in its sign-in details.
        </Text>
        <Flex direction="column" gap="2" role="list" aria-label="Demo accounts">
          {demo.data.people.map((p) => (
            <Flex key={p.email} role="listitem" justify="between" align="center" gap="3">
              <Text size="2">
                <Text weight="bold">{NOTEBOOK_ROLE_LABELS[p.role]}</Text> · {p.name} ·{' '}
                <Text className="upwell-mono" size="1">
                  {p.email}
                </Text>
              </Text>
              <Button variant="soft" size="1" aria-label={`Fill in as ${NOTEBOOK_ROLE_LABELS[p.role].toLowerCase()} ${p.name}`} onClick={() => onPick(p)}>
                Use
              </Button>
            </Flex>
          ))}
        </Flex>
      </Flex>
    </Card>
  );
}
