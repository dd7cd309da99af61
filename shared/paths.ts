/**
 * Client routes that the server links to from e-mails: the route pattern the client's router matches and the
 * builder for a link to it, written once so an e-mail can never point at a screen that has moved.
 */
export const sharedPaths = {
  applicantRequest: { path: '/my/requests/:id', getHref: (id: string) => `/my/requests/${id}` },
  officeRequest: {
    path: '/office/requests/:id',
    getHref: (id: string, tab = '') => `/office/requests/${id}${tab ? `?tab=${tab}` : ''}`,
  },
  crewBoard: { path: '/crew/board', getHref: () => '/crew/board' },
  /** The road authority inspector's page; the link's token follows in the #fragment. */
  inspectorPage: { path: '/inspect/:id', getHref: (id: string) => `/inspect/${id}` },
  crewFieldSheet: { path: '/crew/jobs/:id/field-sheet', getHref: (id: string) => `/crew/jobs/${id}/field-sheet` },
} as const;
