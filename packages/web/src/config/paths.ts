/** Every route path in one place; components link through `getHref`, never a typed string. */
export const paths = {
  network: {
    path: '/',
    getHref: () => '/',
  },
  status: {
    path: '/status',
    getHref: () => '/status',
  },
  signIn: {
    path: '/sign-in',
    getHref: () => '/sign-in',
  },
} as const;
