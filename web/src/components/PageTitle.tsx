import { Flex, Heading, Text } from '@radix-ui/themes';
import type { ReactNode } from 'react';

/** A page's heading with an optional line under it and actions beside it. */
export function PageTitle({ title, subtitle, actions }: { title: string; subtitle?: ReactNode; actions?: ReactNode }) {
  return (
    <Flex justify="between" align="end" gap="4" wrap="wrap" mb="4">
      <div>
        <Heading as="h1" size="7" mb="1">
          {title}
        </Heading>
        {subtitle && (
          <Text as="p" color="gray" size="3">
            {subtitle}
          </Text>
        )}
      </div>
      {actions && <Flex gap="2">{actions}</Flex>}
    </Flex>
  );
}
