import { NotFoundView } from '../components/error-view';

export function NotFoundRoute() {
  return <NotFoundView />;
}
