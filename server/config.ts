/**
 * Server settings from the environment, read and checked once at start-up:
 * PORT (0–65535, default 3000), HOST (default 127.0.0.1: loopback only), RUNWRIGHT_ACCESS_TOKEN
 * (optional; when set, every request needs it; at least 16 characters). RUNWRIGHT_DB_FILE is read by
 * db/client.ts (databaseFileFromEnv).
 */
export const ACCESS_TOKEN_ENV = 'RUNWRIGHT_ACCESS_TOKEN';
export const MIN_TOKEN_LENGTH = 16;

export interface ServerConfig {
  readonly port: number;
  readonly host: string;
  readonly accessToken?: string;
}

export class ConfigError extends Error {
  override readonly name = 'ConfigError';
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
  return { port: Number(rawPort), host, ...(token === undefined ? {} : { accessToken: token }) };
}
