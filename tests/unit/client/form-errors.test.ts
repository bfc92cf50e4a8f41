import { describe, expect, it } from "vitest";
import { createFormControl } from "react-hook-form";
import { z } from "zod";
import { toApiError } from "@/lib/client/fetcher";
import { applyServerErrors } from "@/lib/client/form-errors";
import { AppError } from "@/lib/errors";
import { errorResponse } from "@/lib/http";

type Values = {
  name: string;
  note: string;
  blockKinds: string[];
  running: { distanceM: number; runInM: number };
};

// A react-hook-form form outside React (the library's own createFormControl, what useForm wraps).
function form() {
  const f = createFormControl<Values>({
    defaultValues: { name: "", note: "", blockKinds: [], running: { distanceM: 30, runInM: 20 } },
  });
  const error = (name: Parameters<typeof f.getFieldState>[0]) => f.getFieldState(name).error?.message;
  return { ...f, error };
}

// The refusal a handler sends for this body, read back the way the browser reads it.
const refusalFor = async (schema: z.ZodType, body: unknown) => {
  const parsed = schema.safeParse(body);
  if (parsed.success) throw new Error("expected the body to be refused");
  return toApiError(errorResponse(parsed.error));
};

describe("applyServerErrors: the server's field messages on a react-hook-form form", () => {
  it("puts each field's first message on the path the server named, nested paths included", async () => {
    const schema = z.object({
      name: z.string().min(1, "Give it a name").max(3, "Too long"),
      running: z.object({ distanceM: z.number().max(600, "At most 600 m"), runInM: z.number() }),
    });
    const err = await refusalFor(schema, { name: "", running: { distanceM: 900, runInM: 20 } });
    const f = form();
    expect(applyServerErrors(f, err)).toBe(true);
    expect(f.error("name")).toBe("Give it a name");
    expect(f.error("running.distanceM")).toBe("At most 600 m");
    expect(f.error("running.runInM")).toBeUndefined();
  });

  it("with a field list, an item's message lands on its list field and unknown fields are skipped", async () => {
    const schema = z.object({
      blockKinds: z.array(z.enum(["plyometric"], { error: "Choose a kind" })),
      other: z.string(),
    });
    const err = await refusalFor(schema, { blockKinds: ["swim"], other: 1 });
    expect(Object.keys(err.fields).sort()).toEqual(["blockKinds.0", "other"]);
    const f = form();
    expect(applyServerErrors(f, err, ["name", "blockKinds"])).toBe(true);
    expect(f.error("blockKinds")).toBe("Choose a kind");
    expect(f.getFieldState("name").invalid).toBe(false);
  });

  it("with a function, each server path lands on the form field the function names, and null skips it", async () => {
    // A form whose body is sent in another shape (a typed-in table sent as CSV lines): the server names lines.
    const err = await toApiError(
      errorResponse(
        new AppError("invalid", "Check line 2", {
          fields: { "line 2 distance_m": ["At most 600 m", "x"], "line 2 note": ["Too long"], other: ["y"] },
        }),
      ),
    );
    const f = form();
    const toField = (path: string) =>
      path === "line 2 distance_m" ? ("running.distanceM" as const) : path === "line 2 note" ? ("note" as const) : null;
    expect(applyServerErrors(f, err, toField)).toBe(true);
    expect(f.error("running.distanceM")).toBe("At most 600 m");
    expect(f.error("note")).toBe("Too long");
    expect(f.getFieldState("name").invalid).toBe(false);
    expect(applyServerErrors(form(), err, () => null)).toBe(false);
  });

  it("says nothing was placed when the refusal names no field of the form (the caller shows the message)", async () => {
    const err = await toApiError(errorResponse(new AppError("forbidden", "You do not have access to this")));
    const f = form();
    expect(applyServerErrors(f, err, ["name"])).toBe(false);
    expect(applyServerErrors(f, err)).toBe(false);
    const onlyOther = await toApiError(errorResponse(new AppError("invalid", "Bad", { fields: { other: ["x"] } })));
    expect(applyServerErrors(f, onlyOther, ["name", "note"])).toBe(false);
    expect(f.getFieldState("name").invalid).toBe(false);
  });

  it("takes a failed server action's result as well as a fetch refusal", () => {
    const f = form();
    const result = { ok: false as const, message: "Check the highlighted fields", fields: { note: ["Too long", "x"] } };
    expect(applyServerErrors(f, result, ["note"])).toBe(true);
    expect(f.error("note")).toBe("Too long");
    expect(applyServerErrors(f, { ok: false, message: "Busy" })).toBe(false);
    expect(applyServerErrors(f, new Error("network"))).toBe(false);
    expect(applyServerErrors(f, null)).toBe(false);
  });
});
