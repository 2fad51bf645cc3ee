import 'express-session';

/** What Fieldcurve keeps in a browser's server-side session. */
declare module 'express-session' {
  interface SessionData {
    userId: string;
    organisationId: string;
    csrfToken: string;
    /** Set between the redirect to the identity provider and its callback. */
    pendingSignIn: {
      state: string;
      nonce: string;
      codeVerifier: string;
      returnTo: string;
    };
    /** Set when the session was ended from elsewhere (see ended-session.ts). */
    endedReason: string;
    /** Carried through sign-in when the person arrived by an invitation link. */
    invitationToken: string;
  }
}
