/**
 * The Content-Security-Policy of the built page, added as a <meta> tag at build time only (the development
 * server injects inline scripts for hot reload, which this policy forbids). Scripts and styles come only
 * from the page's own files; no eval, no inline code, no plugins; pictures may also be data:/blob: URLs
 * (downloads of the views are built that way). frame-ancestors cannot be set from a <meta> tag.
 */
import type { Plugin } from 'vite';

export const CONTENT_SECURITY_POLICY = [
  "default-src 'self'",
  "script-src 'self'",
  "style-src 'self'",
  "img-src 'self' data: blob:",
  "font-src 'self'",
  "connect-src 'self'",
  "object-src 'none'",
  "base-uri 'none'",
  "form-action 'none'",
].join('; ');

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
