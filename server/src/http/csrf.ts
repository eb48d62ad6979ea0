import { csrfSync } from 'csrf-sync';

/**
 * Synchronizer-token CSRF protection for cookie sessions: the token lives in the session and the
 * apps send it back in the `x-csrf-token` header on every state-changing request.
 */
export const csrf = csrfSync({
  getTokenFromRequest: (req) => {
    const header = req.headers['x-csrf-token'];
    return typeof header === 'string' ? header : undefined;
  },
  errorConfig: { statusCode: 403, message: 'Security check failed', code: 'EBADCSRFTOKEN' },
});
