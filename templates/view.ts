/**
 * Per-request view context: the CSRF token that every form carries and the unit system the page shows.
 * Set once by the server around a page (ViewContext.Provider); read by components with useView().
 * Templates stay pure functions of their props and this context.
 */
import { createContext, useContext } from 'hono/jsx';
import type { UnitSystem } from '../core/index.js';

export interface View {
  /** Token for the hidden `_csrf` form field and the `x-csrf-token` header of htmx requests. */
  readonly csrf: string;
  /** Unit system of the page. */
  readonly units: UnitSystem;
  /** The user's own choice (cookie), shown in the header switch. */
  readonly userUnits: UnitSystem;
  /** Path of the current page (for the units switch to come back to). */
  readonly path: string;
  /** Whether an access token protects this server (shows the sign-out button). */
  readonly signedIn: boolean;
}

export const DEFAULT_VIEW: View = { csrf: '', units: 'si', userUnits: 'si', path: '/', signedIn: false };

export const ViewContext = createContext<View>(DEFAULT_VIEW);

export function useView(): View {
  return useContext(ViewContext);
}

/** Name of the hidden CSRF form field and of the htmx request header. */
export const CSRF_FIELD = '_csrf';
export const CSRF_HEADER = 'x-csrf-token';
