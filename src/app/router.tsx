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
      { path: paths.media.path, lazy: () => import('./routes/media.tsx') },
      { path: paths.pages.path, lazy: () => import('./routes/pages/page-list.tsx') },
      { path: paths.pageEdit.path, lazy: () => import('./routes/pages/page-edit.tsx') },
      { path: paths.pageReview.path, lazy: () => import('./routes/pages/page-review.tsx') },
      { path: paths.pageRevisions.path, lazy: () => import('./routes/pages/page-revisions.tsx') },
      { path: paths.calculator.path, lazy: () => import('./routes/calculator.tsx') },
      { path: paths.statements.path, lazy: () => import('./routes/statements/statement-list.tsx') },
      { path: paths.statement.path, lazy: () => import('./routes/statements/statement-detail.tsx') },
      { path: paths.catalogue.path, lazy: () => import('./routes/catalogue/catalogue-list.tsx') },
      { path: paths.catalogueImport.path, lazy: () => import('./routes/catalogue/catalogue-import.tsx') },
      { path: paths.catalogueObject.path, lazy: () => import('./routes/catalogue/catalogue-object.tsx') },
      { path: paths.sources.path, lazy: () => import('./routes/catalogue/sources.tsx') },
      {
        element: (
          <RequireRole roles={['admin', 'editor']}>
            <OutletPassThrough />
          </RequireRole>
        ),
        children: [
          { path: paths.venues.path, lazy: () => import('./routes/venues/venue-list.tsx') },
          { path: paths.venue.path, lazy: () => import('./routes/venues/venue-detail.tsx') },
          { path: paths.publishing.path, lazy: () => import('./routes/publishing/channel-list.tsx') },
          { path: paths.channel.path, lazy: () => import('./routes/publishing/channel-edit.tsx') },
        ],
      },
      {
        path: 'admin',
        element: (
          <RequireRole roles={['admin']}>
            <OutletPassThrough />
          </RequireRole>
        ),
        children: [
          { path: 'organisation', lazy: () => import('./routes/admin/organisation.tsx') },
          { path: 'users', lazy: () => import('./routes/admin/users.tsx') },
          { path: 'outbox', lazy: () => import('./routes/admin/outbox.tsx') },
          { path: 'timeline', lazy: () => import('./routes/admin/timeline.tsx') },
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
