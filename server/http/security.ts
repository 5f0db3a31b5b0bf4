// Browser-facing protections: security headers, and a same-origin rule for every state-changing
// API call (better-auth applies its own origin check to its routes).
import type { RequestHandler } from 'express';
import helmet from 'helmet';
import { HttpError } from './errors';

export function securityHeaders(production: boolean): RequestHandler {
  return helmet({
    contentSecurityPolicy: {
      useDefaults: false,
      directives: {
        'default-src': ["'self'"],
        'script-src': ["'self'"],
        // react-native-web writes its styles into <style> elements at run time.
        'style-src': ["'self'", "'unsafe-inline'"],
        'img-src': ["'self'", 'data:', 'blob:'],
        'font-src': ["'self'", 'data:'],
        'connect-src': ["'self'"],
        'object-src': ["'none'"],
        'frame-ancestors': ["'none'"],
        'base-uri': ["'self'"],
        'form-action': ["'self'"],
        ...(production ? { 'upgrade-insecure-requests': [] } : {}),
      },
    },
    // Only over HTTPS does HSTS mean anything; the development server is plain HTTP on loopback.
    strictTransportSecurity: production,
    crossOriginEmbedderPolicy: false,
  });
}

const unsafeMethods = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

// A browser always names the page's origin on a cross-site write; one from another origin is refused.
export function sameOriginWrites(publicUrl: string): RequestHandler {
  const ours = new URL(publicUrl).origin;
  return (req, _res, next) => {
    const origin = req.get('origin');
    if (unsafeMethods.has(req.method) && origin && origin !== ours) {
      next(new HttpError(403, 'foreign_origin', 'Requests from another site are refused.'));
      return;
    }
    next();
  };
}
