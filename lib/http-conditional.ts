/**
 * Whether a GET may be answered 304 Not Modified (RFC 9110 §13.1.2, §13.1.3, §13.2.2): If-None-Match is
 * compared weakly against the current ETag and, when present, decides alone; otherwise If-Modified-Since
 * against Last-Modified at whole seconds (the wire format has no finer unit).
 */
export function isNotModified(req: Request, { etag, lastModified }: { etag: string; lastModified: Date }): boolean {
  const ifNoneMatch = req.headers.get("if-none-match");
  if (ifNoneMatch !== null) {
    const opaque = (tag: string) => tag.trim().replace(/^W\//, "");
    return ifNoneMatch.split(",").some((tag) => tag.trim() === "*" || opaque(tag) === opaque(etag));
  }
  const ifModifiedSince = req.headers.get("if-modified-since");
  if (ifModifiedSince === null) return false;
  const since = Date.parse(ifModifiedSince);
  return Number.isFinite(since) && Math.floor(lastModified.getTime() / 1000) * 1000 <= since;
}

/** The validator headers of a conditional answer (RFC 9110 §8.8.2, §8.8.3). */
export function validatorHeaders({ etag, lastModified }: { etag: string; lastModified: Date }): Record<string, string> {
  return { etag, "last-modified": lastModified.toUTCString() };
}
