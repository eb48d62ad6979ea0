/**
 * A rendered page as the host server may keep it for the next anonymous visitor
 * (server/src/ssr/page-cache.ts): the nonce is still the placeholder, swapped per answer.
 * The host asks for it by putting a function in `res.locals.keepRenderedPage`.
 */
export interface RenderedPage {
  readonly status: number;
  /** Angular's answer headers, without content-length and set-cookie. */
  readonly headers: readonly (readonly [string, string])[];
  /** Whether the render's answer set a cookie (such a page is never kept). */
  readonly setsCookie: boolean;
  readonly html: string;
}

/** index.html carries this marker in `ngCspNonce`; every copy is swapped for the answer's nonce. */
export const NONCE_PLACEHOLDER = '__LB_CSP_NONCE__';

/** The key in `res.locals`. */
export const KEEP_RENDERED_PAGE_KEY = 'keepRenderedPage';

export type KeepRenderedPage = (page: RenderedPage) => void;
