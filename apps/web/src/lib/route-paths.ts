/** Every address the app links to, in one place. */
export const routePaths = {
  overview: '/',
  branches: '/branches',
  signIn: '/sign-in',
} as const;
