import { paths } from '../../../config/paths';

/** The link a lead shares: this site's origin and the code without its dash, e.g. `/join/K7QM3RTX`. */
export function inviteLink(code: string, origin: string = window.location.origin): string {
  return `${origin}${paths.join(code)}`;
}
