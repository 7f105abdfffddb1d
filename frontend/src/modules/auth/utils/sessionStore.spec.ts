import { describe, expect, it, vi } from 'vitest';
import { createMemoryStorage, createSessionStore } from './sessionStore';

const session = { token: 't0k3n', user: { id: 'u1', email: 'researcher@demo.test', displayName: 'Tamsin Oduya' } };

describe(createSessionStore.name, () => {
  it('keeps a session across store instances sharing one storage (a reload)', () => {
    const storage = createMemoryStorage();
    createSessionStore(storage).set(session);
    expect(createSessionStore(storage).get()).toEqual(session);
  });

  it('returns the same object while nothing changed, as useSyncExternalStore requires', () => {
    const store = createSessionStore(createMemoryStorage());
    store.set(session);
    expect(store.get()).toBe(store.get());
  });

  it('tells listeners about sign-in and sign-out, and nothing after unsubscribing', () => {
    const store = createSessionStore(createMemoryStorage());
    const listener = vi.fn();
    const unsubscribe = store.subscribe(listener);
    store.set(session);
    store.clear();
    expect(listener).toHaveBeenCalledTimes(2);
    unsubscribe();
    store.set(session);
    expect(listener).toHaveBeenCalledTimes(2);
  });

  it('does not notify when clearing an empty store', () => {
    const store = createSessionStore(createMemoryStorage());
    const listener = vi.fn();
    store.subscribe(listener);
    store.clear();
    expect(listener).not.toHaveBeenCalled();
  });

  it('treats a stored value of the wrong shape or broken JSON as signed out', () => {
    const storage = createMemoryStorage();
    storage.setItem('stratochron.session', '{"token": 5}');
    expect(createSessionStore(storage).get()).toBeNull();
    storage.setItem('stratochron.session', '{not json');
    expect(createSessionStore(storage).get()).toBeNull();
  });
});
