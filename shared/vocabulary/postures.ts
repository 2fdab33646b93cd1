export const POSTURES = ['standing', 'seated'] as const;
export type Posture = (typeof POSTURES)[number];

export const POSTURE_LABEL: Record<Posture, string> = { standing: 'Standing', seated: 'Seated' };

// Starting breathing-zone heights above the floor, common practice rounded from adult nose height (from memory:
// about 1.5 m standing, about 1.1 m seated on a work chair); the person replaces them with the measured one.
export const POSTURE_BREATHING_HEIGHT_m: Record<Posture, number> = { standing: 1.5, seated: 1.1 };
