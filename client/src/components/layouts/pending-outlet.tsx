import { Outlet, useLocation, useNavigation } from 'react-router';
import { PageSkeleton } from '../ui/page-skeleton';

/**
 * The child page, or its skeleton while the router loads another page (its code and the data its
 * loader awaits): one place for every signed-in page, instead of the old page staying on screen
 * with no sign that the click was taken. Searches and filters on the same page keep it visible.
 */
export function PendingOutlet() {
  const navigation = useNavigation();
  const location = useLocation();
  const toAnotherPage = navigation.state === 'loading' && navigation.location.pathname !== location.pathname;
  return toAnotherPage ? <PageSkeleton /> : <Outlet />;
}
