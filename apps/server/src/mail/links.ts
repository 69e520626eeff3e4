import type { AppConfig } from '../config/app-config.js';

/** What a request tells about where the person reached us. */
export interface RequestOrigin {
  origin?: string | undefined;
  protocol: string;
  host?: string | undefined;
}

/**
 * The address links in e-mails start with: PUBLIC_URL when set; otherwise the page the person was on (the
 * browser's Origin, which survives the dev server's proxy) or this server's own host. Without PUBLIC_URL a caller
 * chooses the address, which is why production should set it.
 */
export function linkBase(config: AppConfig, req: RequestOrigin | undefined): string {
  if (config.PUBLIC_URL) return config.PUBLIC_URL.replace(/\/+$/, '');
  if (req?.origin && /^https?:\/\/[^/\s]+$/.test(req.origin)) return req.origin;
  if (req?.host) return `${req.protocol}://${req.host}`;
  return `http://localhost:${config.PORT}`;
}
