import { Routes } from '@angular/router';
import { signedOutGuard } from '../../core/auth/guards';

const routes: Routes = [
  {
    path: 'sign-in',
    title: 'Sign in · Layerbook',
    canActivate: [signedOutGuard],
    loadComponent: () => import('./sign-in').then((m) => m.SignIn),
  },
  {
    path: 'sign-up',
    title: 'Start a new firm · Layerbook',
    canActivate: [signedOutGuard],
    loadComponent: () => import('./sign-up').then((m) => m.SignUp),
  },
  {
    path: 'sign-up/confirm',
    title: 'Open your firm · Layerbook',
    canActivate: [signedOutGuard],
    loadComponent: () => import('./confirm-sign-up').then((m) => m.ConfirmSignUp),
  },
  {
    path: 'forgot-password',
    title: 'Reset your password · Layerbook',
    loadComponent: () => import('./forgot-password').then((m) => m.ForgotPassword),
  },
  {
    path: 'reset-password',
    title: 'Choose a new password · Layerbook',
    loadComponent: () => import('./reset-password').then((m) => m.ResetPassword),
  },
  {
    path: 'accept-invitation',
    title: 'Join your team · Layerbook',
    loadComponent: () => import('./accept-invitation').then((m) => m.AcceptInvitation),
  },
];

export default routes;
