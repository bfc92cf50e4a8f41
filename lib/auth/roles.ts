export const ROLES = ["head_coach", "coach", "physio", "athlete"] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABEL: Record<Role, string> = {
  head_coach: "Head coach",
  coach: "Coach",
  physio: "Physio",
  athlete: "Athlete",
};
