import { useEffect, useMemo } from 'react';
import { RouterProvider } from 'react-router-dom';
import { paths } from '@/config/paths';
import { subscribe, getSession } from '@/lib/session';
import { AppProvider } from './provider';
import { createRouter } from './router';

export function App() {
  const router = useMemo(createRouter, []);
  // A session that ends (refresh refused, signed out in another tab) returns the user to sign-in.
  useEffect(
    () =>
      subscribe(() => {
        const path = router.state.location.pathname;
        if (!getSession() && path !== paths.signIn.path) void router.navigate(paths.signIn.href(path), { replace: true });
      }),
    [router],
  );
  return (
    <AppProvider>
      <RouterProvider router={router} />
    </AppProvider>
  );
}
