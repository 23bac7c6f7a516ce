/** Every address the app links to, in one place. */
export const routePaths = {
  overview: '/',
  branches: '/branches',
  today: '/today',
  ticket: '/tickets/:ticketId',
  dayClose: '/close-the-day',
  clients: '/clients',
  client: '/clients/:clientId',
  catalogue: '/menu-and-products',
  staff: '/people',
  signIn: '/sign-in',
} as const;
