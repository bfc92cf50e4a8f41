import { z } from "zod";
import "./jitless";

// Every text field of every schema starts from one of these two, so no control character reaches the
// database, a calendar line, a CSV cell or an e-mail header. C0 (U+0000–U+001F), DEL and C1 (U+007F–U+009F)
// are the Unicode "Cc" category; a lone surrogate (Cs) cannot be stored as UTF-8 without being replaced.
// Single-line text also refuses the Unicode line and paragraph separators, which some readers break lines at.
const SINGLE_LINE_FORBIDDEN = /[\p{Cc}\p{Cs}\u2028\u2029]/u;
// Notes typed into a multi-line box keep their tabs and line breaks (CR, LF, CRLF); nothing else.
const MULTI_LINE_FORBIDDEN = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F\p{Cs}]/u;

const CONTROL_MESSAGE = "Remove the control characters (such as NUL or a lone line break)";
const MULTI_LINE_MESSAGE = "Remove the control characters (tabs and line breaks are fine)";

/** A single-line text field (names, titles), trimmed; chain .min/.max for its limits. */
export function lineText(params?: { error: string }) {
  return z
    .string(params)
    .trim()
    .refine((v) => !SINGLE_LINE_FORBIDDEN.test(v), CONTROL_MESSAGE);
}

/** A multi-line note, trimmed: tabs and line breaks are allowed, other control characters are not. */
export function noteText(params?: { error: string }) {
  return z
    .string(params)
    .trim()
    .refine((v) => !MULTI_LINE_FORBIDDEN.test(v), MULTI_LINE_MESSAGE);
}

/** An e-mail address as people type it: trimmed, lower-cased, one line. */
export function emailText(message = "Enter a valid e-mail address") {
  return lineText().toLowerCase().pipe(z.email(message));
}
