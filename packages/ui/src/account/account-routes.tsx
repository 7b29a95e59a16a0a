import type { RouteObject } from 'react-router-dom';

/**
 * The sign-in screens both apps share, as route data. Each path is what better-auth's mails
 * and redirects point at (with the app's base path in front).
 */
export const accountRoutes: RouteObject[] = [
  {
    path: 'sign-in',
    lazy: () => import('./SignInScreen.tsx').then((m) => ({ Component: m.SignInScreen })),
  },
  {
    path: 'sign-up',
    lazy: () => import('./SignUpScreen.tsx').then((m) => ({ Component: m.SignUpScreen })),
  },
  {
    path: 'check-inbox',
    lazy: () => import('./CheckInboxScreen.tsx').then((m) => ({ Component: m.CheckInboxScreen })),
  },
  {
    path: 'confirmed',
    lazy: () =>
      import('./AddressConfirmedScreen.tsx').then((m) => ({ Component: m.AddressConfirmedScreen })),
  },
  {
    path: 'forgot-password',
    lazy: () =>
      import('./ForgotPasswordScreen.tsx').then((m) => ({ Component: m.ForgotPasswordScreen })),
  },
  {
    path: 'reset-password',
    lazy: () =>
      import('./ResetPasswordScreen.tsx').then((m) => ({ Component: m.ResetPasswordScreen })),
  },
  {
    path: 'profile',
    lazy: () => import('./ProfileScreen.tsx').then((m) => ({ Component: m.ProfileScreen })),
  },
  {
    path: 'account-deleted',
    lazy: () =>
      import('./AccountDeletedScreen.tsx').then((m) => ({ Component: m.AccountDeletedScreen })),
  },
];
