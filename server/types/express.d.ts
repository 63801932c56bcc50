import type { Session } from '../../shared/schemas/auth';

declare global {
  namespace Express {
    interface Request {
      /** Set by the session middleware when a valid session cookie came with the request. */
      session?: Session;
    }
  }
}
export {};
