/** Where uploaded bytes live. Local disk by default; an object store could stand in later. */
export interface MediaStorage {
  put(key: string, bytes: Buffer): Promise<void>;
  /** The bytes, or null when nothing is stored under the key. */
  get(key: string): Promise<Buffer | null>;
  delete(key: string): Promise<void>;
}

/** Injection token for the MediaStorage in use. */
export const MEDIA_STORAGE = Symbol('MEDIA_STORAGE');
