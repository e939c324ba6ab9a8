import { plainToInstance } from 'class-transformer';
import {
  IsBooleanString,
  IsIn,
  IsInt,
  IsNotEmpty,
  IsOptional,
  IsString,
  IsUrl,
  Max,
  Min,
  MinLength,
  Validate,
  ValidationArguments,
  ValidateIf,
  validateSync,
  ValidatorConstraint,
  ValidatorConstraintInterface,
} from 'class-validator';

const LOOPBACK_HOSTS = new Set(['127.0.0.1', 'localhost', '[::1]']);

/** True for an http(s) URL on this machine (the local development provider). */
export function isLoopbackUrl(value: string): boolean {
  try {
    return LOOPBACK_HOSTS.has(new URL(value).hostname);
  } catch {
    return false;
  }
}

/** An OpenID issuer must be https (OpenID Connect Discovery 1.0 §3), except a provider on loopback. */
@ValidatorConstraint({ name: 'secureIssuer' })
class SecureIssuerConstraint implements ValidatorConstraintInterface {
  validate(value: unknown): boolean {
    if (typeof value !== 'string') return false;
    try {
      const url = new URL(value);
      return url.protocol === 'https:' || (url.protocol === 'http:' && isLoopbackUrl(value));
    } catch {
      return false;
    }
  }
  defaultMessage(): string {
    return 'must be an https URL (plain http only for a provider on 127.0.0.1 or localhost)';
  }
}

/** The server's own route for the provider's redirect back (AuthController). */
export const SIGN_ON_CALLBACK_PATH = '/api/auth/sign-on/callback';

/**
 * The redirect URI must come back to this server: the same origin as PUBLIC_URL (the
 * sign-on flow cookie is set there and is sent only to it) and the callback route.
 * Anything else would fail every sign-on with a lost-flow error.
 */
@ValidatorConstraint({ name: 'ownCallback' })
class OwnCallbackConstraint implements ValidatorConstraintInterface {
  validate(value: unknown, args: ValidationArguments): boolean {
    if (typeof value !== 'string') return false;
    try {
      const redirect = new URL(value);
      const publicUrl = new URL((args.object as EnvironmentVariables).PUBLIC_URL);
      // No query and no fragment either (RFC 6749 §3.1.2: a redirection endpoint has no fragment).
      return (
        redirect.origin === publicUrl.origin &&
        redirect.pathname === SIGN_ON_CALLBACK_PATH &&
        !value.includes('?') &&
        !value.includes('#')
      );
    } catch {
      return false;
    }
  }
  defaultMessage(): string {
    return `must be PUBLIC_URL's origin followed by ${SIGN_ON_CALLBACK_PATH} (the flow cookie is only sent back there)`;
  }
}

/**
 * With sign-on, PUBLIC_URL must be the server's root: the app is served at "/", and the
 * default redirect URI (PUBLIC_URL + the callback) and the flow cookie's path assume it.
 */
@ValidatorConstraint({ name: 'publicUrlAtRoot' })
class PublicUrlAtRootConstraint implements ValidatorConstraintInterface {
  validate(_value: unknown, args: ValidationArguments): boolean {
    try {
      const url = new URL((args.object as EnvironmentVariables).PUBLIC_URL);
      return url.pathname === '/' && !url.search && !url.hash;
    } catch {
      return false;
    }
  }
  defaultMessage(): string {
    return 'needs PUBLIC_URL to be the server root (scheme, host and port, no path) for sign-on';
  }
}

/** Every environment variable the server reads. Validated once at boot. */
export class EnvironmentVariables {
  @IsIn(['development', 'test', 'production'])
  NODE_ENV: 'development' | 'test' | 'production' = 'development';

  @IsString()
  HOST: string = '127.0.0.1';

  @IsInt() @Min(0) @Max(65535)
  PORT: number = 3000;

  @IsUrl({ protocols: ['postgres', 'postgresql'], require_tld: false, require_protocol: true })
  DATABASE_URL: string;

  @IsInt() @Min(1) @Max(200)
  DATABASE_POOL_SIZE: number = 20;

  /** Where links in e-mails point: the host app's public address. */
  @IsUrl({ require_tld: false, require_protocol: true })
  PUBLIC_URL: string = 'http://127.0.0.1:3000';

  /** Signs player tokens; at least 32 characters. */
  @IsString() @MinLength(32)
  APP_SECRET: string;

  @IsString()
  SMTP_HOST: string = '127.0.0.1';

  @IsInt() @Min(1) @Max(65535)
  SMTP_PORT: number = 2525;

  @IsBooleanString()
  SMTP_SECURE: string = 'false';

  @IsOptional() @IsString()
  SMTP_USER?: string;

  @IsOptional() @IsString()
  SMTP_PASS?: string;

  @IsString()
  MAIL_FROM: string = 'Covalent <no-reply@covalent.invalid>';

  @IsBooleanString()
  COOKIE_SECURE: string = 'false';

  /** Sign-in attempts allowed per address and e-mail within SIGNIN_WINDOW_SECONDS. */
  @IsInt() @Min(1)
  SIGNIN_LIMIT: number = 10;

  @IsInt() @Min(1)
  SIGNIN_WINDOW_SECONDS: number = 900;

  @IsIn(['error', 'warn', 'log', 'debug', 'silent'])
  LOG_LEVEL: 'error' | 'warn' | 'log' | 'debug' | 'silent' = 'log';

  /** Requests per minute per client address on the public join routes (a class behind one address joins at once). */
  @IsInt() @Min(1)
  PLAY_JOIN_LIMIT: number = 300;

  /** Exposes /api/bench/metrics for the load benchmark; never in normal use. */
  @IsBooleanString()
  BENCH_METRICS: string = 'false';

  /** Built front ends, served by the server when present. */
  @IsOptional() @IsString()
  HOST_APP_DIST?: string;

  @IsOptional() @IsString()
  PLAYER_APP_DIST?: string;

  /** Where uploaded images are kept; a relative path is taken from the repository root. */
  @IsString() @MinLength(1)
  MEDIA_DIR: string = '.data/media';

  /** School sign-on (OpenID Connect): the provider's issuer. Sign-on is off when unset. */
  @IsOptional()
  @IsUrl({ require_tld: false, require_protocol: true, protocols: ['http', 'https'] })
  @Validate(SecureIssuerConstraint)
  @Validate(PublicUrlAtRootConstraint)
  OIDC_ISSUER?: string;

  /** Required with OIDC_ISSUER: the client registered for Covalent at the provider. */
  @ValidateIf((env: EnvironmentVariables) => !!env.OIDC_ISSUER)
  @IsString() @IsNotEmpty({ message: 'is required when OIDC_ISSUER is set' })
  OIDC_CLIENT_ID?: string;

  @ValidateIf((env: EnvironmentVariables) => !!env.OIDC_ISSUER)
  @IsString() @IsNotEmpty({ message: 'is required when OIDC_ISSUER is set' })
  OIDC_CLIENT_SECRET?: string;

  /** Defaults to PUBLIC_URL + /api/auth/sign-on/callback; must match the provider's registration exactly. */
  @ValidateIf((env: EnvironmentVariables) => !!env.OIDC_ISSUER && env.OIDC_REDIRECT_URI !== undefined)
  @IsUrl({ require_tld: false, require_protocol: true, protocols: ['http', 'https'] })
  @Validate(OwnCallbackConstraint)
  OIDC_REDIRECT_URI?: string;
}

/** ConfigModule `validate` hook: fails fast, naming every bad variable at once. */
export function validateEnv(raw: Record<string, unknown>): EnvironmentVariables {
  const env = plainToInstance(EnvironmentVariables, raw, { enableImplicitConversion: true });
  const errors = validateSync(env, { skipMissingProperties: false, whitelist: false });
  if (errors.length > 0) {
    const lines = errors.map((e) => `  ${e.property}: ${Object.values(e.constraints ?? {}).join('; ')}`);
    throw new Error(`Invalid environment configuration:\n${lines.join('\n')}`);
  }
  return env;
}
