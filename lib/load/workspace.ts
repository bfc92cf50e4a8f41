/**
 * Grow-only scratch memory for computing many athletes in a row (the squad table): columns computed with a
 * workspace are views into it and are overwritten by the next call, so read what you need first.
 */
export interface EngineWorkspace {
  f64: Float64Array;
  u8: Uint8Array;
}

export function createWorkspace(): EngineWorkspace {
  return { f64: new Float64Array(0), u8: new Uint8Array(0) };
}

/** Makes room for f64Size doubles and u8Size bytes; contents are left as they were (callers zero what they need). */
export function reserve(ws: EngineWorkspace, f64Size: number, u8Size: number): void {
  if (ws.f64.length < f64Size) ws.f64 = new Float64Array(Math.ceil(f64Size * 1.25));
  if (ws.u8.length < u8Size) ws.u8 = new Uint8Array(Math.ceil(u8Size * 1.25));
}
