/** A tiny promise wrapper around one IndexedDB object store (key → value). */
export interface KeyValueStore {
  get<T>(key: string): Promise<T | undefined>;
  set(key: string, value: unknown): Promise<void>;
}

function request<T>(r: IDBRequest<T>): Promise<T> {
  return new Promise((resolve, reject) => {
    r.onsuccess = () => resolve(r.result);
    r.onerror = () => reject(r.error ?? new Error('IndexedDB request failed'));
  });
}

export function indexedDbStore(dbName: string, storeName = 'kv'): KeyValueStore {
  let db: Promise<IDBDatabase> | null = null;
  const open = (): Promise<IDBDatabase> => {
    db ??= new Promise((resolve, reject) => {
      const r = indexedDB.open(dbName, 1);
      r.onupgradeneeded = () => r.result.createObjectStore(storeName);
      r.onsuccess = () => resolve(r.result);
      r.onerror = () => reject(r.error ?? new Error('IndexedDB is not available'));
    });
    return db;
  };
  return {
    async get<T>(key: string) {
      const tx = (await open()).transaction(storeName, 'readonly');
      return (await request(tx.objectStore(storeName).get(key))) as T | undefined;
    },
    async set(key, value) {
      const tx = (await open()).transaction(storeName, 'readwrite');
      await request(tx.objectStore(storeName).put(value, key));
    },
  };
}

/** In-memory fallback (private windows without IndexedDB, tests). */
export function memoryStore(): KeyValueStore {
  const m = new Map<string, unknown>();
  return {
    get: async <T>(k: string) => m.get(k) as T | undefined,
    set: async (k, v) => void m.set(k, v),
  };
}
