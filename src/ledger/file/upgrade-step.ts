/** A step from project file version n to n + 1, on plain parsed JSON. Must not mutate its input. */
export type UpgradeStep = (file: Record<string, unknown>) => Record<string, unknown>;
