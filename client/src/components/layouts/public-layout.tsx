import { Center, Container, Paper, Stack, Text, Title } from '@mantine/core';
import type { ReactNode } from 'react';
import { DocumentTitle } from '../ui/document-title';
import { BroodsilkMark } from '../ui/logo';

/** Sign-in, registration and reset: one calm card. */
export function PublicLayout({ title, subtitle, children }: { title: string; subtitle?: string; children: ReactNode }) {
  return (
    <Container size={440} py={48} component="main" id="main">
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
