import { useSyncExternalStore } from 'react';
import { sessionStore, type Session } from '@/modules/auth/utils/sessionStore';

/** The current session, or null when signed out; re-renders on sign-in and sign-out. */
export function useSession(): Session | null {
  return useSyncExternalStore(sessionStore.subscribe, sessionStore.get, sessionStore.get);
}
