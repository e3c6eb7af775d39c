import "server-only";
import { deleteObject } from "../storage";

/** Delete objects, never failing the caller (a leftover object is logged, not shown). */
export async function deleteObjectsQuietly(keys: string[]): Promise<void> {
  await Promise.all(
    keys.map((k) =>
      deleteObject(k).catch((err) => {
        console.error("[uploads] could not delete object", k, err);
      }),
    ),
  );
}
