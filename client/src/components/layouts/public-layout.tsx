import { Center, Container, Paper, Stack, Text, Title } from '@mantine/core';
import type { ReactNode } from 'react';
import { DocumentTitle } from '../ui/document-title';
import { BroodsilkMark } from '../ui/logo';

/** Sign-in, registration and reset: one calm card (wider where a page has more to read). */
export function PublicLayout({ title, subtitle, size = 440, children }: { title: string; subtitle?: string; size?: number; children: ReactNode }) {
  return (
    <Container size={size} py={48} component="main" id="main">
      <DocumentTitle title={title} />
      <Stack gap="lg">
        <Center>
          <Stack gap={6} align="center">
            <BroodsilkMark size={48} />
            <Title order={1} size="h2">
              {title}
            </Title>
            {subtitle && (
              <Text c="dimmed" ta="center" size="sm">
                {subtitle}
              </Text>
            )}
          </Stack>
        </Center>
        <Paper withBorder p="lg" radius="md">
          {children}
        </Paper>
      </Stack>
    </Container>
  );
}
