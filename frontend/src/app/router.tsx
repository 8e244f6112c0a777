import { lazy, Suspense, type ReactNode } from 'react';
import { createBrowserRouter, Navigate, RouterProvider } from 'react-router-dom';
import { LoadingState } from '../components/feedback';
import { paths } from '../config/paths';
import { AppShell } from './app-shell';
import { RequireAuth } from './require-auth';
import { RouteError } from './routes/route-error';

// Each page is its own chunk: MUI's DataGrid and the form code load only where used.
const LoginPage = lazy(() => import('./routes/login-page'));
const RegisterPage = lazy(() => import('./routes/register-page'));
const InvitationPage = lazy(() => import('./routes/invitation-page'));
const ForgotPasswordPage = lazy(() => import('./routes/forgot-password-page'));
const ResetPasswordPage = lazy(() => import('./routes/reset-password-page'));
const FarmsPage = lazy(() => import('./routes/farms-page'));
const FarmPage = lazy(() => import('./routes/farm-page'));
const NewHousePage = lazy(() => import('./routes/new-house-page'));
const HousePage = lazy(() => import('./routes/house-page'));
const HouseSeasonPage = lazy(() => import('./routes/house-season-page'));
const ReportPage = lazy(() => import('./routes/report-page'));
const SideBySidePage = lazy(() => import('./routes/side-by-side-page'));
const FuelRecordsPage = lazy(() => import('./routes/fuel-records-page'));
const SettingsPage = lazy(() => import('./routes/settings-page'));
const AdminUsersPage = lazy(() => import('./routes/admin-users-page'));
const AdminOutboxPage = lazy(() => import('./routes/admin-outbox-page'));
const MessagesPage = lazy(() => import('./routes/messages-page'));
const NotFoundPage = lazy(() => import('./routes/not-found-page'));

const publicPage = (page: ReactNode) => <Suspense fallback={<LoadingState />}>{page}</Suspense>;

export function createAppRouter() {
  return createBrowserRouter([
    { path: paths.login, element: publicPage(<LoginPage />), errorElement: <RouteError /> },
    { path: paths.register, element: publicPage(<RegisterPage />), errorElement: <RouteError /> },
    { path: paths.forgotPassword, element: publicPage(<ForgotPasswordPage />), errorElement: <RouteError /> },
    { path: 'invitations/:token', element: publicPage(<InvitationPage />), errorElement: <RouteError /> },
    { path: 'reset-password/:token', element: publicPage(<ResetPasswordPage />), errorElement: <RouteError /> },
    {
      element: <RequireAuth />,
      errorElement: <RouteError />,
      children: [
        {
          element: <AppShell />,
          errorElement: <RouteError />,
          children: [
            { index: true, element: <Navigate to={paths.farms} replace /> },
            { path: 'farms', element: <FarmsPage /> },
            { path: 'farms/:farmId', element: <FarmPage /> },
            { path: 'farms/:farmId/houses/new', element: <NewHousePage /> },
            { path: 'farms/:farmId/fuel-records', element: <FuelRecordsPage /> },
            { path: 'houses/:houseId', element: <HousePage /> },
            { path: 'houses/:houseId/season', element: <HouseSeasonPage /> },
            { path: 'reports/:reportId', element: <ReportPage /> },
            { path: 'houses/:houseId/side-by-side', element: <SideBySidePage /> },
            { path: 'settings', element: <SettingsPage /> },
            { path: 'admin/users', element: <AdminUsersPage /> },
            { path: 'admin/outbox', element: <AdminOutboxPage /> },
            { path: 'messages', element: <MessagesPage /> },
          ],
        },
      ],
    },
    { path: '*', element: publicPage(<NotFoundPage />) },
  ]);
}

let appRouter: ReturnType<typeof createAppRouter> | undefined;

export function AppRouter() {
  // One router for the page's life; created on first render so tests can build their own.
  appRouter ??= createAppRouter();
  return <RouterProvider router={appRouter} />;
}
