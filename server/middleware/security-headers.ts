import helmet from 'helmet';

/**
 * helmet's defaults plus a CSP the exported Expo web bundle runs under: its own scripts only, inline
 * styles (react-native-web injects them), data:/blob: images and fonts. `upgrade-insecure-requests` is off
 * outside production so plain-http loopback servers keep working.
 */
export function securityHeaders(production: boolean) {
  return helmet({
    contentSecurityPolicy: {
      directives: {
        defaultSrc: ["'self'"],
        scriptSrc: ["'self'"],
        styleSrc: ["'self'", "'unsafe-inline'"],
        imgSrc: ["'self'", 'data:', 'blob:'],
        fontSrc: ["'self'", 'data:'],
        connectSrc: ["'self'"],
        objectSrc: ["'none'"],
        frameAncestors: ["'none'"],
        baseUri: ["'self'"],
        formAction: ["'self'"],
        upgradeInsecureRequests: production ? [] : null,
      },
    },
    strictTransportSecurity: production,
  });
}
