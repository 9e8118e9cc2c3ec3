import { Center, Loader } from '@mantine/core';
import { useWords } from '@/lib/i18n';

export function PageLoader() {
  const t = useWords();
  return (
    <Center h="60vh">
      <Loader color="moss" aria-label={t('page.shell.loading')} />
    </Center>
  );
}
