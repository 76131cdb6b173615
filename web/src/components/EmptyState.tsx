import { Box, Flex, Heading, Text } from '@radix-ui/themes';
import type { ReactNode } from 'react';

/** An empty screen that says what belongs here and what to do next. */
export function EmptyState({ title, children, action }: { title: string; children: ReactNode; action?: ReactNode }) {
  return (
    <Box className="upwell-sheet" p="6" my="4">
      <Flex direction="column" gap="3" align="start">
        <svg width="72" height="24" viewBox="0 0 72 24" aria-hidden="true" className="upwell-wave">
          <path d="M2 16c8 0 8-10 17-10s9 10 17 10 8-12 17-12 8 6 17 6" fill="none" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
        </svg>
        <Heading as="h2" size="4">
          {title}
        </Heading>
        <Text as="div" size="3" color="gray" className="upwell-prose">
          {children}
        </Text>
        {action}
      </Flex>
    </Box>
  );
}
