import { useSyncExternalStore } from 'react';
import type { Role } from '@linkloom/shared';

export interface SessionUser {
  id: string;
  email: string;
  name: string;
  role: Role;
}

export interface Session {
  accessToken: string;
  expiresAt: string;
  user: SessionUser;
}

const STORAGE_KEY = 'linkloom.session';
const listeners = new Set<() => void>();
let cached: Session | null | undefined;

function read(): Session | null {
  try {
    const raw = window.localStorage.getItem(STORAGE_KEY);
    if (!raw) return null;
    const parsed = JSON.parse(raw) as Session;
    // An expired token would only earn a 401 on the first call; drop it up front instead.
    if (parsed.expiresAt && Date.parse(parsed.expiresAt) <= Date.now()) return null;
    return parsed;
  } catch {
    return null;
  }
}

function emit(): void {
  for (const listener of listeners) listener();
}

export function getSession(): Session | null {
  if (cached === undefined) cached = read();
  return cached;
}

export function setSession(session: Session): void {
  cached = session;
  window.localStorage.setItem(STORAGE_KEY, JSON.stringify(session));
  emit();
}

export function updateSessionUser(user: SessionUser): void {
  const current = getSession();
  if (current) setSession({ ...current, user });
}

export function clearSession(): void {
  cached = null;
  window.localStorage.removeItem(STORAGE_KEY);
  emit();
}

function subscribe(listener: () => void): () => void {
  listeners.add(listener);
  // Another tab signing in or out changes what this tab may do.
  const onStorage = (event: StorageEvent) => {
    if (event.key === STORAGE_KEY) {
      cached = read();
      listener();
    }
  };
  window.addEventListener('storage', onStorage);
  return () => {
    listeners.delete(listener);
    window.removeEventListener('storage', onStorage);
  };
}

/** The signed-in session (token + user), or null; re-renders on sign-in and sign-out. */
export function useSession(): Session | null {
  return useSyncExternalStore(subscribe, getSession, () => null);
}
