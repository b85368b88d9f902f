// Synchronizer-token CSRF protection (csrf-sync): the token lives in the session and must come
// back in the x-csrf-token header on every change.
import { csrfSync } from 'csrf-sync';

export const csrf = csrfSync({
  getTokenFromRequest: (req) => req.get('x-csrf-token'),
});
