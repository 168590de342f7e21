import { createBrowserRouter, type RouteObject } from 'react-router-dom';
import { AppLayout } from './layout';
import { RequireAuth } from './require-auth';
import { RouteError } from './route-error';
import { NotFoundRoute } from './routes/not-found-route';
import { TodayRoute } from './routes/today-route';

const errorElement = <RouteError />;

/** Pages behind the app shell. All but Today are lazy so the first screen stays small (forms and tables load when needed). */
const appRoutes: RouteObject[] = [
  { index: true, element: <TodayRoute />, errorElement },
  { path: 'booths', errorElement, lazy: () => import('./routes/booths-route').then((m) => ({ Component: m.BoothsRoute })) },
  { path: 'racks', errorElement, lazy: () => import('./routes/racks-route').then((m) => ({ Component: m.RacksRoute })) },
  { path: 'calculator', errorElement, lazy: () => import('./routes/calculator-route').then((m) => ({ Component: m.CalculatorRoute })) },
  { path: 'activity', errorElement, lazy: () => import('./routes/activity-route').then((m) => ({ Component: m.ActivityRoute })) },
  {
    path: 'settings',
    errorElement,
    children: [
      { index: true, errorElement, lazy: () => import('./routes/preferences-route').then((m) => ({ Component: m.PreferencesRoute })) },
      { path: 'preferences', errorElement, lazy: () => import('./routes/preferences-route').then((m) => ({ Component: m.PreferencesRoute })) },
      { path: 'shop', errorElement, lazy: () => import('./routes/shop-settings-route').then((m) => ({ Component: m.ShopSettingsRoute })) },
      { path: 'users', errorElement, lazy: () => import('./routes/users-route').then((m) => ({ Component: m.UsersRoute })) },
    ],
  },
  { path: '*', element: <NotFoundRoute />, errorElement },
];

export const routes: RouteObject[] = [
  { path: '/sign-in', errorElement, lazy: () => import('./routes/sign-in-route').then((m) => ({ Component: m.SignInRoute })) },
  {
    path: '/',
    element: <RequireAuth />,
    errorElement,
    children: [
      {
        element: <AppLayout />,
        errorElement,
        // A pathless child so a page's error shows inside the shell, with the navigation still there.
        children: [{ errorElement, children: appRoutes }],
      },
    ],
  },
];

export function createAppRouter() {
  return createBrowserRouter(routes);
}
