import type { Response } from 'express';

/** Vite's build puts content-hashed files under assets/ (name-HASH.ext): their bytes never change. */
const HASHED_ASSET = /[\\/]assets[\\/][^\\/]+-[A-Za-z0-9_-]{8,}\.[a-z0-9]+$/;

/**
 * Cache headers for the served front end: a year and `immutable` only for the hashed assets
 * (RFC 8246); everything else (index.html, icons) revalidates each time so a new build shows at once.
 */
export function setStaticCacheHeaders(res: Response, path: string): void {
  if (HASHED_ASSET.test(path)) res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
  else res.setHeader('Cache-Control', 'no-cache');
}
