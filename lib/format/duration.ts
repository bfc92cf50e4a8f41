// "4 min", "2 min 30 s", "1 h 15 min": a big unit, then the remainder in the small one when there is any.
function twoUnits(amount: number, perBig: number, big: string, small: string): string {
  const total = Math.max(0, Math.round(amount));
  if (total < perBig) return `${total} ${small}`;
  const rest = total % perBig;
  const whole = `${Math.floor(total / perBig)} ${big}`;
  return rest === 0 ? whole : `${whole} ${rest} ${small}`;
}

/** Rest between reps as a person says it: "45 s", "4 min", "2 min 30 s". */
export function formatRest(seconds: number): string {
  return twoUnits(seconds, 60, "min", "s");
}

/** Session length: "45 min", "1 h", "1 h 30 min". */
export function formatMinutes(minutes: number): string {
  return twoUnits(minutes, 60, "h", "min");
}
