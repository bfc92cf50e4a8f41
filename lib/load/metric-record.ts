import type { Metric } from "./types";

/**
 * A record over all metrics, built as one object literal: every record then shares one hidden class, which
 * keeps property access fast (adding keys one by one in a loop gives slow, changing shapes).
 */
export function metricRecord<T>(fn: (m: Metric) => T): Record<Metric, T> {
  return {
    hsrM: fn("hsrM"),
    nearMaxM: fn("nearMaxM"),
    sprintM: fn("sprintM"),
    sprintSteps: fn("sprintSteps"),
    contacts: fn("contacts"),
    srpe: fn("srpe"),
  };
}
