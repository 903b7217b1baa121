/** Every client URL, written once. */
export const paths = {
  home: { path: '/', href: () => '/' },
  signIn: { path: '/sign-in', href: (next?: string) => (next && next !== '/' ? `/sign-in?next=${encodeURIComponent(next)}` : '/sign-in') },
  welcome: { path: '/welcome' },
  resetPassword: { path: '/reset-password' },
  account: { path: '/account', href: () => '/account' },
  calculator: { path: '/calculator', href: () => '/calculator' },
  adminUsers: { path: '/admin/users', href: () => '/admin/users' },
  adminOutbox: { path: '/admin/outbox', href: () => '/admin/outbox' },
} as const;
