// The SWR key of an athlete's restrictions, so any write (a new one, a lift, a coach's override) can revalidate it.
export const restrictionKeys = {
  athlete: (athleteId: number) => `/api/athletes/${athleteId}/restrictions`,
} as const;
