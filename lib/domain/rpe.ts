// Session RPE on the CR-10 scale as modified for training sessions: Foster C et al. 2001, "A new approach to
// monitoring exercise training", J Strength Cond Res 15(1):109–115 (Table 1). Steps 6, 8 and 9 carry no words.

export const CR10_STEPS = [0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10] as const;

/** The verbal anchors of Foster et al. 2001 (Table 1), by rating. */
export const CR10_ANCHORS: Record<number, string> = {
  0: "Rest",
  1: "Very, very easy",
  2: "Easy",
  3: "Moderate",
  4: "Somewhat hard",
  5: "Hard",
  7: "Very hard",
  10: "Maximal",
};

export const CR10_SOURCE = "CR-10 session RPE, Foster et al. 2001 (J Strength Cond Res 15:109)";
