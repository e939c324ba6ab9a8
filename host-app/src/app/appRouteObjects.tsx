import type { RouteObject } from 'react-router-dom';
import { RequireAdmin } from '@/features/auth/components/RequireAdmin';
import { RequireSignedIn } from '@/features/auth/components/RequireSignedIn';
import { AppShell } from '@/features/shell/components/AppShell';
import { PageFallback } from '@/features/shell/components/PageFallback';
import { PublicLayout } from '@/features/shell/components/PublicLayout';
import { RouteErrorBoundary } from '@/features/shell/components/RouteErrorBoundary';
import { routes } from '@/routes';

/** The route tree: public pages, then signed-in pages inside the shell. Pages load on first visit. */
export const appRouteObjects: RouteObject[] = [
  {
    errorElement: <RouteErrorBoundary />,
    HydrateFallback: PageFallback,
    children: [
      {
        element: <PublicLayout />,
        children: [
          { path: routes.signIn.path, lazy: async () => ({ Component: (await import('@/pages/SignInPage')).SignInPage }) },
          {
            path: routes.forgotPassword.path,
            lazy: async () => ({ Component: (await import('@/pages/ForgotPasswordPage')).ForgotPasswordPage }),
          },
          {
            path: routes.resetPassword.path,
            lazy: async () => ({ Component: (await import('@/pages/ResetPasswordPage')).ResetPasswordPage }),
          },
          {
            path: routes.acceptInvite.path,
            lazy: async () => ({ Component: (await import('@/pages/AcceptInvitePage')).AcceptInvitePage }),
          },
        ],
      },
      {
        element: <RequireSignedIn />,
        children: [
          {
            element: <AppShell />,
            children: [
              {
                path: routes.dashboard.path,
                lazy: async () => ({ Component: (await import('@/pages/DashboardPage')).DashboardPage }),
              },
              { path: routes.classes.path, lazy: async () => ({ Component: (await import('@/pages/ClassesPage')).ClassesPage }) },
              {
                path: routes.classDetail.path,
                lazy: async () => ({ Component: (await import('@/pages/ClassDetailPage')).ClassDetailPage }),
              },
              { path: routes.banks.path, lazy: async () => ({ Component: (await import('@/pages/BanksPage')).BanksPage }) },
              {
                path: routes.bank.path,
                lazy: async () => ({ Component: (await import('@/pages/BankEditorPage')).BankEditorPage }),
              },
              {
                path: routes.sessions.path,
                lazy: async () => ({ Component: (await import('@/pages/SessionsPage')).SessionsPage }),
              },
              {
                path: routes.sessionNew.path,
                lazy: async () => ({ Component: (await import('@/pages/SessionSetupPage')).SessionSetupPage }),
              },
              {
                path: routes.debriefs.path,
                lazy: async () => ({ Component: (await import('@/pages/DebriefsPage')).DebriefsPage }),
              },
              {
                path: routes.debrief.path,
                lazy: async () => ({ Component: (await import('@/pages/DebriefPage')).DebriefPage }),
              },
              {
                path: routes.debriefItem.path,
                lazy: async () => ({ Component: (await import('@/pages/DebriefItemPage')).DebriefItemPage }),
              },
              {
                path: routes.classTrends.path,
                lazy: async () => ({ Component: (await import('@/pages/ClassTrendsPage')).ClassTrendsPage }),
              },
              {
                path: routes.studentHistory.path,
                lazy: async () => ({ Component: (await import('@/pages/StudentHistoryPage')).StudentHistoryPage }),
              },
              {
                element: <RequireAdmin />,
                children: [
                  {
                    path: routes.adminStaff.path,
                    lazy: async () => ({ Component: (await import('@/pages/AdminStaffPage')).AdminStaffPage }),
                  },
                ],
              },
            ],
          },
          // The projected host screen: signed in, but full-screen without the shell.
          {
            path: routes.hostSession.path,
            lazy: async () => ({ Component: (await import('@/pages/HostSessionPage')).HostSessionPage }),
          },
        ],
      },
      { path: '*', lazy: async () => ({ Component: (await import('@/pages/NotFoundPage')).NotFoundPage }) },
    ],
  },
];
