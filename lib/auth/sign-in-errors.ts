/**
 * Errors the sign-in forms show; next-auth passes the message through as `error`.
 * Plain strings in a module of their own: the browser's form recognises the
 * unconfirmed-address one to offer a new link.
 */
export const SIGN_IN_ERRORS = {
  wrong: 'That e-mail and password do not match an account.',
  unverified: 'Confirm your e-mail first: follow the link we sent when you signed up.',
} as const;
