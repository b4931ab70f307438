import { createBrowserRouter, type RouteObject } from 'react-router-dom';
import { RouteError } from '@/components/errors/route-error';
import { HomeRedirect, RequireRole, RequireSession } from '@/components/layouts/session-gate';
import { paths } from '@/config/paths';

/** Screens that read the API as well as the phone get TanStack Query's cache; Today reads only the phone. */
const withServerState = (children: RouteObject[]): RouteObject => ({ lazy: () => import('@/components/query-scope'), children });

export const technicianScreens: RouteObject[] = [
  { path: paths.today.path, lazy: () => import('./routes/technician/today') },
  withServerState([
    {
      path: paths.visit.path,
      lazy: () => import('./routes/technician/visit'),
      // Each section loads on its own, so the camera is ready before the wiremap or the signature pad arrive.
      children: [
        { index: true, lazy: () => import('./routes/technician/visit/trail') },
        { path: paths.visitCables.path, lazy: () => import('./routes/technician/visit/cables') },
        { path: paths.visitCable.path, lazy: () => import('./routes/technician/visit/cable') },
        { path: paths.visitCableResults.path, lazy: () => import('./routes/technician/visit/cable-results') },
        { path: paths.visitPoints.path, lazy: () => import('./routes/technician/visit/points') },
        { path: paths.visitPoint.path, lazy: () => import('./routes/technician/visit/point') },
        { path: paths.visitCircuits.path, lazy: () => import('./routes/technician/visit/circuits') },
        { path: paths.visitCircuit.path, lazy: () => import('./routes/technician/visit/circuit') },
        { path: paths.visitSchedule.path, lazy: () => import('./routes/technician/visit/schedule') },
        { path: paths.visitSignOff.path, lazy: () => import('./routes/technician/visit/sign-off') },
        { path: paths.visitPhotoRoutes.path, lazy: () => import('./routes/technician/visit/photo-routes') },
        { path: paths.visitHiddenRoutes.path, lazy: () => import('./routes/technician/visit/hidden-routes') },
      ],
    },
    { path: paths.cableLabels.path, lazy: () => import('./routes/technician/cable-labels') },
    { path: paths.cableOnSite.path, lazy: () => import('./routes/technician/cable') },
    { path: paths.sync.path, lazy: () => import('./routes/technician/sync') },
    { path: paths.me.path, lazy: () => import('./routes/technician/me') },
  ]),
];

const officeScreens: RouteObject[] = [
  { path: paths.jobs.path, lazy: () => import('./routes/office/jobs') },
  { path: paths.job.path, lazy: () => import('./routes/office/job') },
  { path: paths.visitRecord.path, lazy: () => import('./routes/office/visit') },
  { path: paths.cableAtDesk.path, lazy: () => import('./routes/office/cable') },
  { path: paths.schedule.path, lazy: () => import('./routes/office/schedule') },
  { path: paths.customers.path, lazy: () => import('./routes/office/customers') },
  { path: paths.site.path, lazy: () => import('./routes/office/site') },
  { path: paths.siteHiddenRoutes.path, lazy: () => import('./routes/office/site-hidden-routes') },
  { path: paths.conflicts.path, lazy: () => import('./routes/office/conflicts') },
  { path: paths.invoices.path, lazy: () => import('./routes/office/invoices') },
  { path: paths.jobInvoices.path, lazy: () => import('./routes/office/job-invoices') },
  { path: paths.notifiableWork.path, lazy: () => import('./routes/office/notifiable-work') },
  { path: paths.priceList.path, lazy: () => import('./routes/office/price-list') },
  {
    element: <RequireRole roles={['admin']} />,
    children: [{ path: paths.team.path, lazy: () => import('./routes/office/team') }],
  },
];

// Screens load on demand so a technician's phone downloads only its own screens first;
// the service worker still stores every one for use offline.
export const routes: RouteObject[] = [
  {
    // Shown for the moment before the first lazy screen arrives.
    HydrateFallback: () => null,
    errorElement: <RouteError />,
    children: [
      { path: paths.signIn.path, lazy: () => import('./routes/sign-in') },
      withServerState([
        { path: paths.resetPassword.path, lazy: () => import('./routes/reset-password') },
        { path: paths.shared.path, lazy: () => import('./routes/shared') },
      ]),
      {
        element: <RequireSession />,
        children: [
          { index: true, element: <HomeRedirect /> },
          // A cable label's QR code: one address for every role, each sent on to its own screen.
          { path: paths.cable.path, lazy: () => import('./routes/cable-link') },
          {
            element: <RequireRole roles={['technician']} />,
            // The technician's shell brings the local database and sync with it, so it loads on demand too.
            children: [{ lazy: () => import('@/components/layouts/technician-layout'), children: technicianScreens }],
          },
          {
            element: <RequireRole roles={['office', 'admin']} />,
            // The office's shell loads on demand too, so a phone never downloads the desk's navigation.
            children: [withServerState([{ lazy: () => import('@/components/layouts/office-layout'), children: officeScreens }])],
          },
          { path: '*', lazy: () => import('./routes/not-found') },
        ],
      },
    ],
  },
];

export const createRouter = () => createBrowserRouter(routes);
