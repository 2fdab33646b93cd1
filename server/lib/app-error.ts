export type Issue = { path: string; message: string };

export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly issues?: Issue[],
    readonly extra?: Record<string, unknown>,
  ) {
    super(message);
  }
}

export const notFound = (what: string) => new AppError(404, 'not_found', `${what} was not found`);
export const forbidden = () => new AppError(403, 'forbidden', 'You do not have permission to do this');
export const unauthenticated = () => new AppError(401, 'unauthenticated', 'Sign in to continue');
