import { Routes } from '@angular/router';
import { provideFieldDefaults } from '../../../../../shared/app/field-defaults';
import { signedOutGuard } from '../../core/auth/guards';

const routes: Routes = [
  {
    path: 'sign-in',
    title: 'auth.titles.signIn',
    canActivate: [signedOutGuard],
    loadComponent: () => import('./sign-in').then((m) => m.SignIn),
  },
  {
    path: 'sign-in/code',
    title: 'auth.titles.secondFactor',
    canActivate: [signedOutGuard],
    loadComponent: () => import('./second-factor/code-step').then((m) => m.SecondFactorCodeStep),
  },
  {
    path: 'sign-in/set-up',
    title: 'auth.titles.setUpSecondFactor',
    canActivate: [signedOutGuard],
    loadComponent: () => import('./second-factor/enrol-step').then((m) => m.SecondFactorEnrolStep),
  },
  {
    path: 'sign-up',
    title: 'auth.titles.signUp',
    canActivate: [signedOutGuard],
    loadComponent: () => import('./sign-up').then((m) => m.SignUp),
  },
  {
    path: 'sign-up/confirm',
    title: 'auth.titles.confirmSignUp',
    canActivate: [signedOutGuard],
    loadComponent: () => import('./confirm-sign-up').then((m) => m.ConfirmSignUp),
  },
  {
    path: 'forgot-password',
    title: 'auth.titles.forgotPassword',
    loadComponent: () => import('./forgot-password').then((m) => m.ForgotPassword),
  },
  {
    path: 'reset-password',
    title: 'auth.titles.resetPassword',
    loadComponent: () => import('./reset-password').then((m) => m.ResetPassword),
  },
  {
    path: 'accept-invitation',
    title: 'auth.titles.acceptInvitation',
    loadComponent: () => import('./accept-invitation').then((m) => m.AcceptInvitation),
  },
];

// The signed-out pages sit outside the shell, which provides the field defaults to signed-in pages.
export default [{ path: '', providers: [provideFieldDefaults()], children: routes }] satisfies Routes;
