import { Inject, Injectable, Logger } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import type { Configuration } from 'openid-client';
import { appConfig } from '../../config/app.config';
import { oidcConfig } from '../../config/oidc.config';
import { AUTH_CLOCK, Clock } from '../auth.constants';
import { AuthService } from '../auth.service';
import { loadOpenIdClient, OpenIdClientModule } from './openid-client.loader';
import {
  authorizationParams,
  decideSignOnUser,
  emailFromClaims,
  errorForAuthorizationError,
  safeNextPath,
  SignOnError,
  signOnErrorFor,
} from './sign-on-decision';
import { openSignOnFlow, sameState, sealSignOnFlow, SIGN_ON_FLOW_TTL_MS, SpentStates } from './sign-on-flow';

export type SignOnStart = { ok: true; redirectTo: string; flowCookie: string } | { ok: false; error: SignOnError };
export type SignOnFinish = { ok: true; sessionToken: string; next: string } | { ok: false; error: SignOnError };

/** School sign-on as an OpenID Connect relying party (authorization code flow with PKCE). */
@Injectable()
export class SignOnService {
  private readonly logger = new Logger('SignOn');
  private readonly spent = new SpentStates();
  private configuration: Promise<Configuration> | undefined;

  constructor(
    @Inject(oidcConfig.KEY) private readonly oidc: ConfigType<typeof oidcConfig>,
    @Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>,
    @Inject(AUTH_CLOCK) private readonly clock: Clock,
    private readonly auth: AuthService,
  ) {}

  get enabled(): boolean {
    return this.oidc.enabled;
  }

  /** A fresh state, nonce and PKCE verifier, sealed into the flow cookie, and the provider URL to send the browser to. */
  async start(next: unknown): Promise<SignOnStart> {
    let oc: OpenIdClientModule;
    let config: Configuration;
    try {
      oc = await loadOpenIdClient();
      config = await this.discover(oc);
    } catch (err) {
      return this.fail('start', err);
    }
    // Building the URL can fail too (a discovery document without an authorization endpoint).
    try {
      const codeVerifier = oc.randomPKCECodeVerifier();
      const state = oc.randomState();
      const nonce = oc.randomNonce();
      const url = oc.buildAuthorizationUrl(
        config,
        authorizationParams({
          redirectUri: this.oidc.redirectUri,
          scope: this.oidc.scope,
          state,
          nonce,
          codeChallenge: await oc.calculatePKCECodeChallenge(codeVerifier),
        }),
      );
      const flowCookie = sealSignOnFlow(this.app.secret, {
        state,
        nonce,
        codeVerifier,
        next: safeNextPath(next),
        exp: this.clock.now() + SIGN_ON_FLOW_TTL_MS,
      });
      return { ok: true, redirectTo: url.href, flowCookie };
    } catch (err) {
      return this.fail('start', err);
    }
  }

  /**
   * Checks the provider's answer (`rawQuery` is the callback's query string) against the flow
   * cookie, exchanges the code, validates the ID token, and opens a session for the active
   * user with the verified e-mail. Every failure is a code, never a throw.
   */
  async finish(rawQuery: string, flowCookie: unknown): Promise<SignOnFinish> {
    const flow = openSignOnFlow(this.app.secret, flowCookie, this.clock.now());
    if (!flow) return { ok: false, error: 'sign_on_expired' };
    const params = new URLSearchParams(rawQuery);
    // OpenID Connect Core 1.0 §3.1.2.7 and RFC 6749 §10.12: the state must be the one this browser was given.
    if (params.getAll('state').length !== 1 || !sameState(flow.state, params.get('state'))) return { ok: false, error: 'state_mismatch' };
    // Single use: a replayed callback finds its state spent.
    if (!this.spent.spend(flow.state, flow.exp, this.clock.now())) return { ok: false, error: 'sign_on_expired' };
    const providerError = params.get('error');
    if (providerError !== null) return { ok: false, error: errorForAuthorizationError(providerError) };
    if (!params.get('code')) return { ok: false, error: 'sign_on_invalid' };

    let claims: Record<string, unknown> | undefined;
    try {
      const oc = await loadOpenIdClient();
      const config = await this.discover(oc);
      const currentUrl = new URL(this.oidc.redirectUri);
      currentUrl.search = params.toString();
      // openid-client checks the response (state, RFC 9207 iss), sends the PKCE verifier (RFC 7636 §4.5)
      // and validates the ID token: signature, iss, aud, azp, exp, iat and our nonce (OpenID Connect Core 1.0 §3.1.3.7).
      const tokens = await oc.authorizationCodeGrant(config, currentUrl, {
        pkceCodeVerifier: flow.codeVerifier,
        expectedState: flow.state,
        expectedNonce: flow.nonce,
        idTokenExpected: true,
      });
      claims = tokens.claims() as Record<string, unknown> | undefined;
      if (claims && typeof claims.email !== 'string' && typeof claims.sub === 'string') {
        // Providers that keep e-mail out of the ID token give it at UserInfo; its sub must match (§5.3.2).
        claims = { ...(await oc.fetchUserInfo(config, tokens.access_token, claims.sub)), ...claims };
      }
    } catch (err) {
      return this.fail('callback', err);
    }

    const email = emailFromClaims(claims);
    if (!email.ok) return this.refuse(email.error);
    try {
      const user = decideSignOnUser(await this.auth.findUserByEmail(email.value));
      if (!user.ok) return this.refuse(user.error);
      return { ok: true, sessionToken: await this.auth.createSession(user.value.id), next: flow.next };
    } catch (err) {
      // The database, not the provider: still a redirect to the sign-in page, never a 500.
      return this.fail('session', err);
    }
  }

  /** Discovery once, kept; a failure is not kept, so the next attempt asks again. */
  private discover(oc: OpenIdClientModule): Promise<Configuration> {
    this.configuration ??= oc
      .discovery(new URL(this.oidc.issuer), this.oidc.clientId, undefined, oc.ClientSecretBasic(this.oidc.clientSecret), {
        execute: this.oidc.allowHttp ? [oc.allowInsecureRequests] : [],
        timeout: 10,
      })
      .catch((err: unknown) => {
        this.configuration = undefined;
        throw err;
      });
    return this.configuration;
  }

  private fail(step: string, err: unknown): { ok: false; error: SignOnError } {
    const error = signOnErrorFor(err);
    const e = err as { message?: string; code?: string; error?: string };
    this.logger.warn(`sign-on ${step} failed: ${error} (${[e?.code, e?.error, e?.message].filter(Boolean).join(': ')})`);
    return { ok: false, error };
  }

  private refuse(error: SignOnError): { ok: false; error: SignOnError } {
    this.logger.log(`sign-on refused: ${error}`);
    return { ok: false, error };
  }
}
