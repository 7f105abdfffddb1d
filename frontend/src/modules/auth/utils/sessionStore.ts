/** The signed-in user as the sign-in mutation returns them. */
export type SessionUser = {
  id: string;
  email: string;
  displayName: string;
};

/** A bearer token and whose it is. */
export type Session = {
  token: string;
  user: SessionUser;
};

type SessionListener = () => void;

export type SessionStore = {
  get(): Session | null;
  set(session: Session): void;
  clear(): void;
  subscribe(listener: SessionListener): () => void;
  /** Tell listeners the storage was changed from outside (another tab). */
  notifyExternalChange(): void;
};

type KeyValueStorage = Pick<Storage, 'getItem' | 'setItem' | 'removeItem'>;

const STORAGE_KEY = 'stratochron.session';

function isSession(value: unknown): value is Session {
  if (typeof value !== 'object' || value === null) return false;
  const { token, user } = value as Partial<Session>;
  return (
    typeof token === 'string' &&
    typeof user === 'object' &&
    user !== null &&
    typeof user.id === 'string' &&
    typeof user.email === 'string' &&
    typeof user.displayName === 'string'
  );
}

/**
 * A session kept in key-value storage (localStorage in the browser), with listeners so React can
 * follow it through useSyncExternalStore. A stored value that does not parse counts as signed out.
 */
export function createSessionStore(storage: KeyValueStorage): SessionStore {
  const listeners = new Set<SessionListener>();
  let cachedRaw: string | null | undefined;
  let cached: Session | null = null;

  const notify = () => listeners.forEach((listener) => listener());

  return {
    get() {
      const raw = storage.getItem(STORAGE_KEY);
      // useSyncExternalStore needs the same object back while nothing changed.
      if (raw !== cachedRaw) {
        cachedRaw = raw;
        try {
          const parsed: unknown = raw === null ? null : JSON.parse(raw);
          cached = isSession(parsed) ? parsed : null;
        } catch {
          cached = null;
        }
      }
      return cached;
    },
    set(session) {
      storage.setItem(STORAGE_KEY, JSON.stringify(session));
      notify();
    },
    clear() {
      if (storage.getItem(STORAGE_KEY) === null) return;
      storage.removeItem(STORAGE_KEY);
      notify();
    },
    subscribe(listener) {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
    notifyExternalChange: notify,
  };
}

/** Storage for places without localStorage (Node, where the unit tests run). */
export function createMemoryStorage(): KeyValueStorage {
  const values = new Map<string, string>();
  return {
    getItem: (key) => values.get(key) ?? null,
    setItem: (key, value) => void values.set(key, value),
    removeItem: (key) => void values.delete(key),
  };
}

/** The app's session, in localStorage so it survives reloads and is shared by tabs. */
export const sessionStore = createSessionStore(
  typeof localStorage === 'undefined' ? createMemoryStorage() : localStorage,
);

if (typeof window !== 'undefined') {
  // Signing out in one tab signs out the others.
  window.addEventListener('storage', (event) => {
    if (event.key === STORAGE_KEY) sessionStore.notifyExternalChange();
  });
}
