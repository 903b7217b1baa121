import helmet from 'helmet';

/**
 * helmet with a Content-Security-Policy the app really runs under: scripts, styles, fonts and images
 * only from this origin (fonts are bundled, no external hosts). Inline style attributes are allowed
 * because React's `style` prop needs them; inline scripts are not.
 */
export function securityHeaders(https: boolean) {
  return helmet({
    contentSecurityPolicy: {
      useDefaults: false,
      directives: {
        defaultSrc: ["'self'"],
        scriptSrc: ["'self'"],
        styleSrc: ["'self'", "'unsafe-inline'"],
        imgSrc: ["'self'", 'data:', 'blob:'],
        fontSrc: ["'self'", 'data:'],
        connectSrc: ["'self'"],
        mediaSrc: ["'self'"],
        workerSrc: ["'self'"],
        objectSrc: ["'none'"],
        baseUri: ["'self'"],
        formAction: ["'self'"],
        frameAncestors: ["'none'"],
        ...(https ? { upgradeInsecureRequests: [] } : {}),
      },
    },
    strictTransportSecurity: https,
    crossOriginEmbedderPolicy: false,
  });
}
