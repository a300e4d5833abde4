import "server-only";
import { mkdir, readFile, rm, writeFile, rename } from "node:fs/promises";
import path from "node:path";
import { randomBytes } from "node:crypto";
import type { MediaStore } from "@/db/exerciseRules";

/**
 * Where uploaded files live. Small on purpose (put, get, remove by key) so a
 * driver for S3-compatible storage can replace the local one without the
 * callers noticing.
 */
export type Storage = MediaStore;

// Keys are flat names; anything with a folder separator or dot-dot is refused
// so no key can reach outside the storage folder.
const SAFE_KEY = /^[A-Za-z0-9][A-Za-z0-9._-]{0,199}$/;

function checkKey(key: string): void {
  if (!SAFE_KEY.test(key) || key.includes("..")) throw new Error(`storage: unsafe key ${JSON.stringify(key)}`);
}

/**
 * Files on the local disk: `<dir>/<key>` holds the bytes and
 * `<dir>/<key>.type` the content type. Writes go to a temporary name first
 * and are renamed into place, so a reader never sees half a file.
 */
export function localDiskStorage(dir: string): Storage {
  const file = (key: string) => path.join(dir, key);
  return {
    async put(key, bytes, contentType) {
      checkKey(key);
      await mkdir(dir, { recursive: true });
      const tmp = path.join(dir, `.tmp-${randomBytes(6).toString("hex")}`);
      await writeFile(`${tmp}.type`, contentType, "utf8");
      await writeFile(tmp, bytes);
      await rename(`${tmp}.type`, `${file(key)}.type`);
      await rename(tmp, file(key));
    },
    async get(key) {
      if (!SAFE_KEY.test(key) || key.includes("..")) return null;
      try {
        const [bytes, contentType] = await Promise.all([readFile(file(key)), readFile(`${file(key)}.type`, "utf8")]);
        return { bytes: new Uint8Array(bytes), contentType: contentType.trim() };
      } catch (err) {
        if ((err as NodeJS.ErrnoException).code === "ENOENT") return null;
        throw err;
      }
    },
    async remove(key) {
      checkKey(key);
      await rm(file(key), { force: true });
      await rm(`${file(key)}.type`, { force: true });
    },
  };
}

let instance: Storage | null = null;

/** The process's storage: `IQ_UPLOADS_DIR` when set, else `.data/uploads` in the project folder. */
export function getStorage(): Storage {
  instance ??= localDiskStorage(process.env.IQ_UPLOADS_DIR || path.join(process.cwd(), ".data", "uploads"));
  return instance;
}
