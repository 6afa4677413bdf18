import type { RequestHandler } from 'express';

/** One year with subdomains: helmet's default, which the app sent before it became per request. */
export const HSTS_VALUE = 'max-age=31536000; includeSubDomains';

/**
 * Strict-Transport-Security on responses that arrived over TLS, and only those (RFC 6797 §7.2:
 * a host must not send it over plain HTTP). Behind a TLS-terminating proxy, req.secure trusts
 * X-Forwarded-Proto only when TRUST_PROXY names that proxy, so a client cannot fake it.
 */
export const strictTransportSecurity: RequestHandler = (req, res, next) => {
  if (req.secure) res.setHeader('Strict-Transport-Security', HSTS_VALUE);
  next();
};
