import { createBrowserRouter, type RouteObject } from 'react-router-dom';
import { FullPageStatus } from './full-page-status';
import { AppLayout } from './layout';
import { RequireAuth } from './require-auth';
import { RouteError } from './route-error';
import { NotFoundRoute } from './routes/not-found-route';
import { ReadyWallError } from './routes/ready-wall-error';
import { TodayRoute } from './routes/today-route';

const errorElement = <RouteError />;
// Shown while the first page's code loads; without it React Router warns on every first visit.
const hydrateFallbackElement = <FullPageStatus>Opening Boothwright…</FullPageStatus>;

/** Pages behind the app shell. All but Today are lazy so the first screen stays small (forms and tables load when needed). */
const appRoutes: RouteObject[] = [
  { index: true, element: <TodayRoute />, errorElement },
  { path: 'booths', errorElement, lazy: () => import('./routes/booths-route').then((m) => ({ Component: m.BoothsRoute })) },
  { path: 'racks', errorElement, lazy: () => import('./routes/racks-route').then((m) => ({ Component: m.RacksRoute })) },
  { path: 'planner', errorElement, lazy: () => import('./routes/planner-route').then((m) => ({ Component: m.PlannerRoute })) },
  { path: 'spray-sessions', errorElement, lazy: () => import('./routes/spray-sessions-route').then((m) => ({ Component: m.SpraySessionsRoute })) },
  { path: 'spray-sessions/:id', errorElement, lazy: () => import('./routes/spray-session-route').then((m) => ({ Component: m.SpraySessionRoute })) },
  { path: 'coat-log', errorElement, lazy: () => import('./routes/coat-log-route').then((m) => ({ Component: m.CoatLogRoute })) },
  { path: 'calculator', errorElement, lazy: () => import('./routes/calculator-route').then((m) => ({ Component: m.CalculatorRoute })) },
  { path: 'activity', errorElement, lazy: () => import('./routes/activity-route').then((m) => ({ Component: m.ActivityRoute })) },
  { path: 'reports', errorElement, lazy: () => import('./routes/reports-route').then((m) => ({ Component: m.ReportsRoute })) },
  { path: 'data-sheets', errorElement, lazy: () => import('./routes/data-sheets-route').then((m) => ({ Component: m.DataSheetsRoute })) },
  { path: 'data-sheets/new', errorElement, lazy: () => import('./routes/new-product-route').then((m) => ({ Component: m.NewProductRoute })) },
  { path: 'data-sheets/:id', errorElement, lazy: () => import('./routes/product-route').then((m) => ({ Component: m.ProductRoute })) },
  { path: 'finish-systems', errorElement, lazy: () => import('./routes/finish-systems-route').then((m) => ({ Component: m.FinishSystemsRoute })) },
  { path: 'jobs', errorElement, lazy: () => import('./routes/jobs-route').then((m) => ({ Component: m.JobsRoute })) },
  { path: 'jobs/:id', errorElement, lazy: () => import('./routes/job-route').then((m) => ({ Component: m.JobRoute })) },
  { path: 'jobs/:id/import', errorElement, lazy: () => import('./routes/job-import-route').then((m) => ({ Component: m.JobImportRoute })) },
  { path: 'jobs/:id/tags', errorElement, lazy: () => import('./routes/job-tags-route').then((m) => ({ Component: m.JobTagsRoute })) },
  { path: 'parts/:id', errorElement, lazy: () => import('./routes/part-route').then((m) => ({ Component: m.PartRoute })) },
  { path: 'ready', errorElement, lazy: () => import('./routes/ready-route').then((m) => ({ Component: m.ReadyRoute })) },
  { path: 'upkeep', errorElement, lazy: () => import('./routes/upkeep-route').then((m) => ({ Component: m.UpkeepRoute })) },
  { path: 'crew', errorElement, lazy: () => import('./routes/crew-route').then((m) => ({ Component: m.CrewRoute })) },
  { path: 'crew/:userId', errorElement, lazy: () => import('./routes/crew-person-route').then((m) => ({ Component: m.CrewPersonRoute })) },
  {
    path: 'settings',
    errorElement,
    children: [
      { index: true, errorElement, lazy: () => import('./routes/preferences-route').then((m) => ({ Component: m.PreferencesRoute })) },
      { path: 'preferences', errorElement, lazy: () => import('./routes/preferences-route').then((m) => ({ Component: m.PreferencesRoute })) },
      { path: 'shop', errorElement, lazy: () => import('./routes/shop-settings-route').then((m) => ({ Component: m.ShopSettingsRoute })) },
      { path: 'users', errorElement, lazy: () => import('./routes/users-route').then((m) => ({ Component: m.UsersRoute })) },
      { path: 'sites', errorElement, lazy: () => import('./routes/sites-route').then((m) => ({ Component: m.SitesRoute })) },
      { path: 'mailbox', errorElement, lazy: () => import('./routes/mailbox-route').then((m) => ({ Component: m.MailboxRoute })) },
    ],
  },
  { path: '*', element: <NotFoundRoute />, errorElement },
];

export const routes: RouteObject[] = [
  { path: '/sign-in', errorElement, hydrateFallbackElement, lazy: () => import('./routes/sign-in-route').then((m) => ({ Component: m.SignInRoute })) },
  {
    path: '/',
    element: <RequireAuth />,
    errorElement,
    hydrateFallbackElement,
    children: [
      {
        element: <AppLayout />,
        errorElement,
        // A pathless child so a page's error shows inside the shell, with the navigation still there.
        children: [{ errorElement, children: appRoutes }],
      },
      // The wall screen sits outside the shell (no navigation) and recovers from its own errors.
      {
        path: 'ready/wall',
        errorElement: <ReadyWallError />,
        lazy: () => import('./routes/ready-wall-route').then((m) => ({ Component: m.ReadyWallRoute })),
      },
    ],
  },
];

export function createAppRouter() {
  return createBrowserRouter(routes);
}
