// A function when the address is only known once the server listens (development and tests).
export type PublicUrl = string | (() => string);

// Links are built only from configuration, never from a request's Origin or Host header.
export function baseUrl(configured: PublicUrl): string {
  return (typeof configured === 'function' ? configured() : configured).replace(/\/+$/, '');
}
