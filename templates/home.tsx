/** Start page and sign-in page. */
import { CsrfInput } from './layout.js';

export function HomePage() {
  return (
    <>
      <h1>Runwright</h1>
      <p class="lead">Runway length requirements for airport planning studies: takeoff and landing lengths for the aircraft that regularly use a runway, at the site's hot-day temperature, elevation and gradient, for today's fleet and each forecast.</p>
      <ol class="steps">
        <li><a href="/sites">Sites</a>: elevation, monthly climate (the design temperature follows), runways with their centreline profile and declared distances.</li>
        <li><a href="/aircraft">Aircraft catalogue</a>: performance profiles, with their reference field length and classification.</li>
        <li><a href="/studies">Studies</a>: fleet scenarios, options, results with the critical aircraft and the recommended length, charts, downloads, and what-ifs.</li>
      </ol>
      <p class="muted">A JSON API serves the same data under <a href="/api">/api</a>.</p>
    </>
  );
}

export function LoginPage(p: { next: string; enabled: boolean; error?: string }) {
  return (
    <>
      <h1>Sign in</h1>
      {!p.enabled ? <p>This server does not ask for an access token. <a href={p.next}>Continue</a>.</p> : (
        <form method="post" action="/login" class="login">
          <CsrfInput />
          <input type="hidden" name="next" value={p.next} />
          <p>This server is protected by an access token. Enter it to continue; it is kept in a cookie for this browser.</p>
          <div class={`field${p.error ? ' has-error' : ''}`}>
            <label for="f-token">Access token</label>
            <input id="f-token" name="token" type="password" autocomplete="current-password" aria-invalid={p.error ? 'true' : undefined} aria-describedby={p.error ? 'e-token' : undefined} />
            {p.error ? <p class="error" id="e-token">{p.error}</p> : null}
          </div>
          <p class="actions"><button type="submit" class="primary">Sign in</button></p>
        </form>
      )}
    </>
  );
}
