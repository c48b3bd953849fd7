import { isEndpointId, type EndpointId } from '@/features/playground/model/endpoints';

// The playground's recent requests, kept in this browser only, per signed-in account and team, so that
// people sharing a machine or switching teams do not see each other's requests.

export type HistoryEntry = {
  id: string;
  /** ISO time the answer arrived. */
  at: string;
  endpoint: EndpointId;
  /** HTTP status, or null when no answer arrived (network failure). */
  status: number | null;
  resultId: string | null;
  /** The request as it was in the editor; null when it was too large to keep. */
  request: string | null;
};

export const historyLimit = 20;
/** Larger requests are listed without their text so a few big bodies cannot fill the storage quota. */
export const maxStoredRequestLength = 100_000;

export function historyStorageKey(userId: string, teamId: string): string {
  return `leastline.playground-history.v1:${userId}:${teamId}`;
}

function isEntry(value: unknown): value is HistoryEntry {
  if (typeof value !== 'object' || value === null) return false;
  const entry = value as Record<string, unknown>;
  return (
    typeof entry.id === 'string' &&
    typeof entry.at === 'string' &&
    isEndpointId(entry.endpoint) &&
    (entry.status === null || typeof entry.status === 'number') &&
    (entry.resultId === null || typeof entry.resultId === 'string') &&
    (entry.request === null || typeof entry.request === 'string')
  );
}

export function readHistory(storage: Storage, key: string): HistoryEntry[] {
  try {
    const parsed: unknown = JSON.parse(storage.getItem(key) ?? '[]');
    return Array.isArray(parsed) ? parsed.filter(isEntry).slice(0, historyLimit) : [];
  } catch {
    return [];
  }
}

/** Puts the entry first and keeps the most recent `historyLimit`; returns the list as stored. */
export function addToHistory(storage: Storage, key: string, entry: Omit<HistoryEntry, 'id'>): HistoryEntry[] {
  const stored: HistoryEntry = {
    ...entry,
    id: `${Date.parse(entry.at) || Date.now()}-${Math.random().toString(36).slice(2, 8)}`,
    request: entry.request !== null && entry.request.length <= maxStoredRequestLength ? entry.request : null,
  };
  const next = [stored, ...readHistory(storage, key)].slice(0, historyLimit);
  try {
    storage.setItem(key, JSON.stringify(next));
  } catch {
    // Storage full or disabled: the list still shows this session's entries.
  }
  return next;
}

export function clearHistory(storage: Storage, key: string): void {
  storage.removeItem(key);
}
