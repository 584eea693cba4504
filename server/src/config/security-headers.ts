import helmet from 'helmet';

/**
 * Helmet's defaults with a content security policy cut to what the built client uses: its own scripts, fonts and API
 * only. Styles allow 'unsafe-inline' because Mantine writes its theme variables into a <style> element and sets
 * style attributes at run time; scripts stay 'self' with no inline script at all. Photos and the invoice logo are
 * fetched with the bearer token and shown through blob: URLs. The card checkout is a full-page navigation to the
 * payment service's own origin, which a policy on this origin does not govern.
 */
export function securityHeaders(https: boolean) {
  return helmet({
    // Over plain http on loopback, HSTS and upgrade-insecure-requests would send the browser to an https that is not there.
    strictTransportSecurity: https,
    contentSecurityPolicy: {
      useDefaults: false,
      directives: {
        defaultSrc: ["'self'"],
        baseUri: ["'self'"],
        scriptSrc: ["'self'"],
        scriptSrcAttr: ["'none'"],
        styleSrc: ["'self'", "'unsafe-inline'"],
        imgSrc: ["'self'", 'data:', 'blob:'],
        fontSrc: ["'self'"],
        connectSrc: ["'self'"],
        objectSrc: ["'none'"],
        formAction: ["'self'"],
        frameAncestors: ["'none'"],
        upgradeInsecureRequests: https ? [] : null,
      },
    },
  });
}
