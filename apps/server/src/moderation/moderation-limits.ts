import { REPORTS_PER_HOUR } from '@barwright/contracts';

/** Per-member limits of the moderation features; tests lower them through AppDeps.moderationLimits. */
export interface ModerationLimits {
  /** Reports one member may file in a rolling hour. */
  reportsPerHour: number;
}

export const DEFAULT_MODERATION_LIMITS: ModerationLimits = { reportsPerHour: REPORTS_PER_HOUR };
