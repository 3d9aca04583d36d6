// A request as a signed-in caller sends it, for calling route handlers (app/api/**/route.ts) directly in tests.
//
// Sign-in is being added: route handlers will require a session. This is the one place that will attach it (a
// session cookie or bearer header for a test user); until then it only builds the Request, so every route-level
// test already goes through it and needs no change when the session arrives.

export interface AuthenticatedRequestInit extends RequestInit {
  /** Role of the test user the session will belong to, once sign-in exists (ignored until then). */
  role?: string;
}

/** `new Request(url, init)` with the test session attached (none yet); a streamed body gets `duplex: "half"`. */
export async function authenticatedRequest(url: string, init: AuthenticatedRequestInit = {}): Promise<Request> {
  const { role: _role, ...rest } = init;
  const streamed = rest.body instanceof ReadableStream;
  return new Request(url, { ...rest, ...(streamed ? { duplex: "half" } : {}) } as RequestInit);
}
