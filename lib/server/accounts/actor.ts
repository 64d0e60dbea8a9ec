import "server-only";

// Who is acting: taken from the session by the server wrappers, passed explicitly to services
// so the services stay testable without cookies. null means nobody is signed in.
export interface SignedInActor {
  id: string;
  email: string;
  name: string;
  verified: boolean;
}
export type Actor = SignedInActor | null;
