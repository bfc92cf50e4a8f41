/** T4 splits: vmax 9.5 m/s, τ 1.1 s (lib/speed/README.md §1 [C], model of Furusawa, Hill & Parkinson 1927). */
export const T4_GATES = [
  { distanceM: 0, timeS: 0 },
  { distanceM: 10, timeS: 1.969 },
  { distanceM: 20, timeS: 3.142 },
  { distanceM: 30, timeS: 4.2345 },
  { distanceM: 40, timeS: 5.3017 },
];
