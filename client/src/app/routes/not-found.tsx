import { ErrorPage } from '@/components/ui/error-page';

export function Component() {
  return <ErrorPage status={404} title="Nothing here" message="This page does not exist, or it belongs to a project you are not part of." />;
}
