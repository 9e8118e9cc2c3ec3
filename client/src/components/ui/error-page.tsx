import { Button, Container, Stack, Text, Title } from '@mantine/core';
import { Link } from 'react-router';
import { DocumentTitle } from './document-title';
import { useWords } from '@/lib/i18n';

export function ErrorPage({ title, message, status }: { title: string; message: string; status?: number }) {
  const t = useWords();
  return (
    <Container size={560} py={64} component="main" id="main">
      <DocumentTitle title={title} />
      <Stack align="flex-start">
        {status && (
          <Text className="tone-failed" fw={700}>
            {status}
          </Text>
        )}
        <Title order={1}>{title}</Title>
        <Text>{message}</Text>
        <Button component={Link} to="/" variant="light">
          {t('page.shell.backToToday')}
        </Button>
      </Stack>
    </Container>
  );
}
