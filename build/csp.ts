/**
 * The page's security policy and the headers a server must send with it.
 *
 * The Content-Security-Policy of the built page: scripts and styles come only from the page's own files; no
 * eval, no inline code, no plugins; pictures may also be data:/blob: URLs (downloads of the views are built
 * that way); and no other site may show the page in a frame. It is put into the built index.html as a
 * <meta> tag (so a static copy of dist/ is protected on any host), and sent as a header by `npm run preview`
 * (vite preview) together with the other headers below; only a header can forbid framing (frame-ancestors)
 * and sniffing. The development server (`npm start`) sends the same headers with the two relaxations its hot
 * reload needs (an inline script and injected styles, and its WebSocket).
 */
import type { Plugin } from 'vite';

const DIRECTIVES = [
  "default-src 'self'",
  "script-src 'self'",
  "style-src 'self'",
  "img-src 'self' data: blob:",
  "font-src 'self'",
  "connect-src 'self'",
  "object-src 'none'",
  "base-uri 'none'",
  "form-action 'none'",
];

/** The policy of the built page, as the <meta> tag carries it (a <meta> tag cannot hold frame-ancestors). */
export const CONTENT_SECURITY_POLICY = DIRECTIVES.join('; ');

/** The same policy as a header, which also forbids every framing of the page. */
export const CONTENT_SECURITY_POLICY_HEADER = `${CONTENT_SECURITY_POLICY}; frame-ancestors 'none'`;

/** Headers besides the policy: no guessing of content types, no framing in older browsers, no referrer. */
const OTHER_HEADERS = {
  'X-Content-Type-Options': 'nosniff',
  'X-Frame-Options': 'DENY',
  'Referrer-Policy': 'no-referrer',
};

/** Every header a deployment of the built page must send (README.md lists them). */
export const PAGE_HEADERS: Record<string, string> = {
  'Content-Security-Policy': CONTENT_SECURITY_POLICY_HEADER,
  ...OTHER_HEADERS,
};

/**
 * The development server's headers: the page's policy, except that scripts may be inline (the hot-reload
 * preamble), styles may be injected (CSS modules arrive as <style> elements) and the page may open the
 * server's WebSocket. Framing and sniffing stay forbidden.
 */
export const DEV_HEADERS: Record<string, string> = {
  'Content-Security-Policy': CONTENT_SECURITY_POLICY_HEADER.replace(
    "script-src 'self'",
    "script-src 'self' 'unsafe-inline'",
  )
    .replace("style-src 'self'", "style-src 'self' 'unsafe-inline'")
    .replace("connect-src 'self'", "connect-src 'self' ws: wss:"),
  ...OTHER_HEADERS,
};

/** A Vite plugin that puts the policy at the top of the built index.html. */
export function contentSecurityPolicy(): Plugin {
  return {
    name: 'polewright-csp',
    apply: 'build',
    transformIndexHtml: {
      order: 'post',
      handler: () => [
        {
          tag: 'meta',
          attrs: { 'http-equiv': 'Content-Security-Policy', content: CONTENT_SECURITY_POLICY },
          injectTo: 'head-prepend',
        },
      ],
    },
  };
}
