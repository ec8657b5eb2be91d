/** Hono environment of the web app: the per-request variables the middleware sets. */
import type { UnitSystem } from '../../core/index.js';

export interface AppVariables {
  /** CSRF token of this browser (cookie value), for forms and the htmx header. */
  csrf: string;
  /** The user's unit choice (cookie), 'si' when unset. */
  userUnits: UnitSystem;
  /** True when an access token protects the server and this request carried it. */
  signedIn: boolean;
}

export interface AppEnv {
  Variables: AppVariables;
}
