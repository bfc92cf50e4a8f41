import type { FieldPath, FieldValues, UseFormSetError } from "react-hook-form";
import type { FieldErrors } from "@/lib/errors";

/** The per-field messages of a refusal: an ApiError from the fetcher, or a failed server action's result. */
function fieldsOf(source: unknown): FieldErrors {
  const fields = (source as { fields?: unknown } | null)?.fields;
  return fields && typeof fields === "object" ? (fields as FieldErrors) : {};
}

/**
 * Shows the server's per-field messages (`{ error: { fields } }` from lib/http.ts, or an action's `fields`) on the
 * form's fields, the first message of each. Without `only`, each lands on the path the server named (nested
 * paths such as `running.distanceM` included). With a field list, a message lands on the listed field it belongs
 * to (`blockKinds.0` on `blockKinds`) and messages for anything else are left to the caller. With a function, the
 * function names the form field of each server path (a form whose body is built into another shape, such as a
 * CSV line), or null to leave it. Returns whether any message was placed, so the caller can show the general
 * message instead.
 */
export function applyServerErrors<T extends FieldValues>(
  form: { setError: UseFormSetError<T> },
  source: unknown,
  only?: readonly FieldPath<T>[] | ((serverPath: string) => FieldPath<T> | null),
): boolean {
  let placed = false;
  for (const [path, messages] of Object.entries(fieldsOf(source))) {
    const message = messages[0];
    if (message === undefined) continue;
    const name = typeof only === "function" ? only(path) : only ? listedField(only, path) : (path as FieldPath<T>);
    if (name === undefined || name === null) continue;
    form.setError(name, { message });
    placed = true;
  }
  return placed;
}

function listedField<T extends FieldValues>(only: readonly FieldPath<T>[], path: string): FieldPath<T> | undefined {
  return only.find((f) => f === path) ?? only.find((f) => path.startsWith(`${f}.`));
}
