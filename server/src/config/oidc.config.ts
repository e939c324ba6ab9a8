import { registerAs } from '@nestjs/config';
import { isLoopbackUrl, SIGN_ON_CALLBACK_PATH, validateEnv } from './env.validation';

export { SIGN_ON_CALLBACK_PATH };

/** School sign-on through OpenID Connect; `enabled` is false when OIDC_ISSUER is unset. */
export const oidcConfig = registerAs('oidc', () => {
  const env = validateEnv(process.env);
  const publicUrl = env.PUBLIC_URL.replace(/\/$/, '');
  const issuer = env.OIDC_ISSUER?.trim() || undefined;
  return {
    enabled: !!issuer,
    issuer: issuer ?? '',
    clientId: env.OIDC_CLIENT_ID ?? '',
    clientSecret: env.OIDC_CLIENT_SECRET ?? '',
    redirectUri: env.OIDC_REDIRECT_URI ?? `${publicUrl}${SIGN_ON_CALLBACK_PATH}`,
    /** Plain http is accepted only for a provider on this machine (validated at boot). */
    allowHttp: !!issuer && isLoopbackUrl(issuer),
    scope: 'openid email profile',
  };
});
export type OidcConfig = ReturnType<typeof oidcConfig>;
