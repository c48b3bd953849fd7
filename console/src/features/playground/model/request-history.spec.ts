import { beforeEach, describe, expect, it } from 'vitest';
import {
  addToHistory,
  historyLimit,
  historyStorageKey,
  maxStoredRequestLength,
  readHistory,
} from '@/features/playground/model/request-history';

const key = historyStorageKey('user-1', 'team-1');

function entry(index: number) {
  return {
    at: new Date(Date.UTC(2026, 0, 1, 0, index)).toISOString(),
    endpoint: 'fits' as const,
    status: 201,
    resultId: `result-${index}`,
    request: `{"n": ${index}}`,
  };
}

beforeEach(() => window.localStorage.clear());

describe('playground history', () => {
  it('keeps the newest entries first and at most the limit', () => {
    for (let index = 0; index < historyLimit + 5; index += 1) addToHistory(window.localStorage, key, entry(index));
    const stored = readHistory(window.localStorage, key);
    expect(stored).toHaveLength(20);
    expect(stored[0]?.resultId).toBe(`result-${historyLimit + 4}`);
    expect(stored[19]?.resultId).toBe('result-5');
  });

  it('keeps each account and team apart', () => {
    addToHistory(window.localStorage, key, entry(1));
    expect(readHistory(window.localStorage, historyStorageKey('user-2', 'team-1'))).toEqual([]);
    expect(readHistory(window.localStorage, historyStorageKey('user-1', 'team-2'))).toEqual([]);
  });

  it('lists a very large request without its text', () => {
    const [stored] = addToHistory(window.localStorage, key, { ...entry(1), request: 'x'.repeat(maxStoredRequestLength + 1) });
    expect(stored?.request).toBeNull();
    expect(stored?.resultId).toBe('result-1');
  });

  it('ignores stored values it does not recognise', () => {
    window.localStorage.setItem(key, JSON.stringify([{ id: 'a', endpoint: 'not-an-endpoint' }, 'junk']));
    expect(readHistory(window.localStorage, key)).toEqual([]);
    window.localStorage.setItem(key, '{not json');
    expect(readHistory(window.localStorage, key)).toEqual([]);
  });
});
