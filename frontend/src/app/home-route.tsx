import { HomePage } from '../features/home/routes/home-page';
import { useSession } from '../lib/session';
import { navItemsFor } from './layout/nav-items';

/** The home page lists the same pages the navigation offers the person, so the two never disagree. */
export function HomeRoute() {
  const { user } = useSession();
  const places = navItemsFor(user.role).filter((item) => item.to !== '/');
  return <HomePage places={places} />;
}
