/**
 * Origin comparison that also works for app:// (Node's URL reports the origin of a custom scheme
 * as "null", so scheme and host are compared directly). Ports are part of the host, and default
 * ports are normalised away by the URL parser.
 */
export function isSameOrigin(url: string, origin: string): boolean {
  try {
    const a = new URL(url);
    const b = new URL(origin);
    return a.protocol === b.protocol && a.host !== '' && a.host === b.host;
  } catch {
    return false;
  }
}
