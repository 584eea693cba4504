import { useSyncExternalStore } from 'react';
import type { Role } from '@keenroute/shared';

export interface SessionUser {
  id: string;
  email: string;
  name: string;
  role: Role;
}

export interface AuthResponse {
  accessToken: string;
  user: SessionUser;
}

export type SessionState =
  | { status: 'restoring' }
  | { status: 'signed-in'; user: SessionUser }
  | { status: 'signed-out'; reason: 'expired' | 'signed-out' | 'never-signed-in' };

type Listener = () => void;

// The access token lives in memory only; the refresh cookie (httpOnly) is what survives a reload.
let accessToken: string | null = null;
let state: SessionState = { status: 'restoring' };
const listeners = new Set<Listener>();

function publish(next: SessionState): void {
  state = next;
  for (const listener of listeners) listener();
}

export const session = {
  getState: (): SessionState => state,
  getAccessToken: (): string | null => accessToken,
  start: (auth: AuthResponse): void => {
    accessToken = auth.accessToken;
    publish({ status: 'signed-in', user: auth.user });
  },
  end: (reason: 'expired' | 'signed-out' | 'never-signed-in'): void => {
    accessToken = null;
    publish({ status: 'signed-out', reason });
  },
  subscribe: (listener: Listener): (() => void) => {
    listeners.add(listener);
    return () => listeners.delete(listener);
  },
};

export function useSession(): SessionState {
  return useSyncExternalStore(session.subscribe, session.getState);
}

/** For screens under the sign-in guard, where a signed-in user is certain. */
export function useSignedInUser(): SessionUser {
  const current = useSession();
  if (current.status !== 'signed-in') throw new Error('useSignedInUser is used outside the signed-in routes');
  return current.user;
}
