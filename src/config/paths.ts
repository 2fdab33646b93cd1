export const paths = {
  home: '/',
  login: '/sign-in',
  setPassword: '/set-password',
  scenarios: '/scenarios',
  station: '/station',
  people: '/people',
  outbox: '/outbox',
  particleCalculator: '/calculators/particle',
  hoodCalculator: '/calculators/hood',
  engineCheck: '/dev/engine',
} as const;

export const api = {
  login: '/api/auth/login',
  logout: '/api/auth/logout',
  me: '/api/auth/me',
  setPassword: '/api/auth/set-password',
  people: '/api/people',
  person: (id: number) => `/api/people/${id}`,
  passwordLink: (id: number) => `/api/people/${id}/password-link`,
  outbox: '/api/outbox',
} as const;
