import { createBrowserRouter, Outlet, RouterProvider } from 'react-router-dom';
import { AppShell } from '@/components/layouts/app-shell.tsx';
import { paths } from '@/config/paths.ts';
import { RequireRole, RequireUser } from '@/lib/auth.tsx';

const router = createBrowserRouter([
  { path: paths.signIn.path, lazy: () => import('./routes/sign-in.tsx') },
  { path: paths.welcome.path, lazy: () => import('./routes/welcome.tsx') },
  { path: paths.resetPassword.path, lazy: () => import('./routes/reset-password.tsx') },
  {
    element: (
      <RequireUser>
        <AppShell />
      </RequireUser>
    ),
    children: [
      { index: true, lazy: () => import('./routes/home.tsx') },
      { path: paths.account.path, lazy: () => import('./routes/account.tsx') },
      {
        path: 'admin',
        element: <RequireRole roles={['admin']}><OutletPassThrough /></RequireRole>,
        children: [
          { path: 'users', lazy: () => import('./routes/admin/users.tsx') },
          { path: 'outbox', lazy: () => import('./routes/admin/outbox.tsx') },
        ],
      },
      { path: '*', lazy: () => import('./routes/not-found.tsx') },
    ],
  },
]);

/** Lets a role gate wrap a group of child routes. */
function OutletPassThrough() {
  return <Outlet />;
}

export function AppRouter() {
  return <RouterProvider router={router} />;
}
