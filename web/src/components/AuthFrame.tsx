import { Box, Flex, Text } from '@radix-ui/themes';
import type { ReactNode } from 'react';

/** The sign-in and sign-up pages' frame: what Upwell is for, beside the form. */
export function AuthFrame({ children }: { children: ReactNode }) {
  return (
    <Flex minHeight="100vh" align="center" justify="center" p="5" gap="9" wrap="wrap">
      <Box maxWidth="420px">
        <Text as="p" size="8" className="upwell-wordmark" mb="3">
          Upwell
        </Text>
        <Text as="p" size="4" className="upwell-prose">
          Write up how El Niño and La Niña events move carbon through the ocean, with figures and numbers that stay bound to your
          group’s series.
        </Text>
      </Box>
      <Box width="380px">{children}</Box>
    </Flex>
  );
}
