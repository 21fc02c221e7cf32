import { useIsFetching, useIsMutating } from '@tanstack/react-query';
import { useNavigation } from 'react-router-dom';

/** A thin bar at the top while the app loads a page, fetches in the background or saves. */
export function ProgressBar() {
  const navigation = useNavigation();
  const fetching = useIsFetching();
  const mutating = useIsMutating();
  const busy = navigation.state !== 'idle' || fetching > 0 || mutating > 0;
  if (!busy) return null;
  return (
    <div
      role="progressbar"
      aria-label={mutating > 0 ? 'Saving' : 'Loading'}
      className="fixed inset-x-0 top-0 z-50 h-0.5 overflow-hidden bg-accent-soft"
    >
      <span className="block h-full w-1/3 animate-[hl-progress_1.2s_ease-in-out_infinite] bg-accent" />
    </div>
  );
}
