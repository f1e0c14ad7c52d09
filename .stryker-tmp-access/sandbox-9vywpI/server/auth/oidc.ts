// @ts-nocheck
import { CodeChallengeMethod, OAuth2Client, generateCodeVerifier, generateState } from 'arctic';
import { createRemoteJWKSet, jwtVerify, type JWTPayload } from 'jose';
import { z } from 'zod';

/** Where sign-in goes: any OpenID Connect issuer, the local fake one included. */
export interface OidcConfig {
  /** Issuer URL exactly as the provider names itself in its ID tokens. */
  issuer: string;
  clientId: string;
  /** Null for a public client (PKCE alone), as the local fake provider is set up. */
  clientSecret: string | null;
  /** This app's callback, registered with the provider: `<public URL>/api/auth/callback`. */
  redirectUri: string;
  scopes?: string[];
}

const discoverySchema = z.object({
  issuer: z.string().url(),
  authorization_endpoint: z.string().url(),
  token_endpoint: z.string().url(),
  jwks_uri: z.string().url(),
  userinfo_endpoint: z.string().url().optional(),
});
export type Discovery = z.infer<typeof discoverySchema>;

export interface VerifiedIdentity {
  issuer: string;
  subject: string;
  email: string;
  emailVerified: boolean;
  name: string;
}

/** Talks to the provider: builds the authorize URL, trades the code, verifies the ID token. */
export class OidcClient {
  private discovery?: Promise<Discovery>;
  private jwks?: ReturnType<typeof createRemoteJWKSet>;
  private readonly oauth: OAuth2Client;

  constructor(readonly config: OidcConfig) {
    this.oauth = new OAuth2Client(config.clientId, config.clientSecret, config.redirectUri);
  }

  /** The provider's discovery document, fetched once; a failure is forgotten so the next sign-in retries. */
  discover(): Promise<Discovery> {
    this.discovery ??= (async () => {
      const url = `${this.config.issuer.replace(/\/$/, '')}/.well-known/openid-configuration`;
      const response = await fetch(url, { signal: AbortSignal.timeout(10_000) });
      if (!response.ok) throw new Error(`The sign-in provider's discovery document at ${url} answered ${response.status}.`);
      const doc = discoverySchema.parse(await response.json());
      // OpenID Connect Discovery 1.0 §4.3: the document must name the issuer it was fetched for.
      if (doc.issuer.replace(/\/$/, '') !== this.config.issuer.replace(/\/$/, '')) {
        throw new Error(`The discovery document at ${url} names the issuer ${doc.issuer}, not ${this.config.issuer}.`);
      }
      this.jwks = createRemoteJWKSet(new URL(doc.jwks_uri));
      return doc;
    })().catch((error: unknown) => {
      this.discovery = undefined;
      throw error;
    });
    return this.discovery;
  }

  async startSignIn(): Promise<{ url: URL; state: string; codeVerifier: string; nonce: string }> {
    const doc = await this.discover();
    const state = generateState();
    const codeVerifier = generateCodeVerifier();
    const nonce = generateState();
    const url = this.oauth.createAuthorizationURLWithPKCE(
      doc.authorization_endpoint,
      state,
      CodeChallengeMethod.S256,
      codeVerifier,
      this.config.scopes ?? ['openid', 'profile', 'email'],
    );
    url.searchParams.set('nonce', nonce);
    return { url, state, codeVerifier, nonce };
  }

  /** Trades the code for tokens and checks the ID token's signature, issuer, audience, expiry and nonce. */
  async finishSignIn(code: string, codeVerifier: string, expectedNonce: string): Promise<VerifiedIdentity> {
    const doc = await this.discover();
    const tokens = await this.oauth.validateAuthorizationCode(doc.token_endpoint, code, codeVerifier);
    const { payload } = await jwtVerify(tokens.idToken(), this.jwks!, {
      issuer: doc.issuer,
      audience: this.config.clientId,
      requiredClaims: ['sub', 'exp', 'iat'],
    });
    if (payload.nonce !== expectedNonce) throw new IdTokenRejected('The ID token does not carry the nonce this sign-in sent.');
    let claims: JWTPayload = payload;
    if ((!claims.email || !claims.name) && doc.userinfo_endpoint) {
      const response = await fetch(doc.userinfo_endpoint, {
        headers: { authorization: `Bearer ${tokens.accessToken()}` },
        signal: AbortSignal.timeout(10_000),
      });
      if (response.ok) {
        const info = (await response.json()) as JWTPayload;
        if (info.sub === payload.sub) claims = { ...info, ...payload };
      }
    }
    const email = typeof claims.email === 'string' ? claims.email.trim().toLowerCase() : '';
    if (!email) throw new IdTokenRejected('The sign-in provider did not give an e-mail address; ask for the "email" scope.');
    const name = typeof claims.name === 'string' && claims.name.trim() ? claims.name.trim() : email;
    return { issuer: doc.issuer, subject: payload.sub!, email, emailVerified: claims.email_verified === true, name };
  }
}

export class IdTokenRejected extends Error {}
