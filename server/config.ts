/**
 * Server settings from the environment, read and checked once at start-up:
 * PORT (0–65535, default 3000), HOST (default 127.0.0.1: loopback only), RUNWRIGHT_ACCESS_TOKEN
 * (optional; when set, every request needs it; at least 16 characters), RUNWRIGHT_ALLOW_OPEN_NETWORK
 * (1 to serve a non-loopback HOST without an access token). RUNWRIGHT_DB_FILE is read by db/client.ts
 * (databaseFileFromEnv).
 *
 * A HOST other than a loopback address makes the server reachable from the network. Without an access
 * token anyone who can reach it could read and change every study, so that start is refused unless
 * RUNWRIGHT_ALLOW_OPEN_NETWORK=1 says it is meant (a trusted network); the start then prints a
 * warning. With a token the start prints a reminder that the token travels in clear text without TLS.
 */
export const ACCESS_TOKEN_ENV = 'RUNWRIGHT_ACCESS_TOKEN';
export const OPEN_NETWORK_ENV = 'RUNWRIGHT_ALLOW_OPEN_NETWORK';
export const MIN_TOKEN_LENGTH = 16;

export interface ServerConfig {
  readonly port: number;
  readonly host: string;
  readonly accessToken?: string;
  /** Printed at start-up: the server is reachable from the network (see readServerConfig). */
  readonly warning?: string;
}

export class ConfigError extends Error {
  override readonly name = 'ConfigError';
}

/** Whether `host` is a loopback address or name (127.0.0.0/8, ::1, localhost). */
export function isLoopbackHost(host: string): boolean {
  const h = host.toLowerCase().replace(/^\[(.*)\]$/, '$1');
  if (h === 'localhost' || h.endsWith('.localhost') || h === '::1' || /^(0{1,4}:){7}0{0,3}1$/.test(h)) return true;
  return /^(::ffff:)?127\.\d{1,3}\.\d{1,3}\.\d{1,3}$/.test(h);
}

function flag(env: NodeJS.ProcessEnv, name: string): boolean {
  const raw = env[name];
  if (raw === undefined) return false;
  const v = raw.trim().toLowerCase();
  if (v === '1' || v === 'true' || v === 'yes') return true;
  if (v === '' || v === '0' || v === 'false' || v === 'no') return false;
  throw new ConfigError(`${name}: "${raw}" is not allowed; expected 1 (yes) or 0 (no)`);
}

export function readServerConfig(env: NodeJS.ProcessEnv): ServerConfig {
  const rawPort = env.PORT ?? '3000';
  if (!/^\d{1,5}$/.test(rawPort.trim()) || Number(rawPort) > 65535) {
    throw new ConfigError(`PORT: "${rawPort}" is not allowed; expected a whole number from 0 to 65535`);
  }
  const host = (env.HOST ?? '127.0.0.1').trim();
  if (host === '' || /[\s/]/.test(host)) throw new ConfigError(`HOST: "${env.HOST}" is not allowed; expected a host name or IP address such as 127.0.0.1`);
  const token = env[ACCESS_TOKEN_ENV];
  if (token !== undefined) {
    if (token.trim() === '') throw new ConfigError(`${ACCESS_TOKEN_ENV} is set but blank; unset it or give a token of at least ${MIN_TOKEN_LENGTH} characters`);
    if (token.length < MIN_TOKEN_LENGTH) throw new ConfigError(`${ACCESS_TOKEN_ENV}: too short (${token.length} characters); use at least ${MIN_TOKEN_LENGTH}`);
    if (/\s/.test(token)) throw new ConfigError(`${ACCESS_TOKEN_ENV}: must not contain spaces`);
  }
  let warning: string | undefined;
  if (!isLoopbackHost(host)) {
    if (token === undefined && !flag(env, OPEN_NETWORK_ENV)) {
      throw new ConfigError(
        `HOST: "${host}" is not a loopback address, so the server would be reachable from the network with no access token: ` +
          `anyone who can reach it could read and change every study. Set ${ACCESS_TOKEN_ENV} (at least ${MIN_TOKEN_LENGTH} characters), ` +
          `or set ${OPEN_NETWORK_ENV}=1 if this network is trusted, or leave HOST unset to listen on 127.0.0.1 only.`,
      );
    }
    warning = token === undefined
      ? `WARNING: listening on ${host} with no access token (${OPEN_NETWORK_ENV}=1): anyone who can reach this address can read and change every study.`
      : `Note: listening on ${host}; the access token and the session cookie travel in clear text unless a TLS proxy is in front.`;
  }
  return { port: Number(rawPort), host, ...(token === undefined ? {} : { accessToken: token }), ...(warning === undefined ? {} : { warning }) };
}
