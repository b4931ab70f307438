import { lazy, Suspense } from 'react';
import { useRegisterSW } from 'virtual:pwa-register/react';

// The message itself loads only when there is a new version to offer.
const UpdateMessage = lazy(() => import('./update-message'));

/**
 * A new version waits until the user says so: swapping it in unasked could lose a half-filled form
 * or break screens that are still loading parts of the old version.
 */
export function UpdatePrompt() {
  const {
    needRefresh: [needRefresh, setNeedRefresh],
    updateServiceWorker,
  } = useRegisterSW({
    onRegisteredSW(_url, registration) {
      // Look for a new version every hour while the app stays open.
      if (registration) setInterval(() => void registration.update().catch(() => undefined), 60 * 60 * 1000);
    },
  });
  if (!needRefresh) return null;
  return (
    <Suspense fallback={null}>
      <UpdateMessage onLater={() => setNeedRefresh(false)} onUpdate={() => void updateServiceWorker(true)} />
    </Suspense>
  );
}
