import { ErrorPage } from '@/components/ui/error-page';
import { useWords } from '@/lib/i18n';

export function Component() {
  const t = useWords();
  return <ErrorPage status={404} title={t('page.shell.errorPage.nothingHere')} message={t('page.shell.errorPage.noSuchPage')} />;
}
