/** Shown next to every load flag (UI and e-mail): one wording, kept with the flags themselves. */
export { LOAD_CAUTION as LOAD_FLAG_CAUTION } from "@/lib/load/flag-display";
