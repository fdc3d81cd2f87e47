import { COMMENT_EDIT_WINDOW_MS, COMMENTS_PER_MINUTE, PHOTO_MAX_BYTES, PHOTO_MAX_PIXELS, PHOTOS_PER_DAY } from '@barwright/contracts';

/** The community's per-member limits; tests lower them through AppDeps.communityLimits. */
export interface CommunityLimits {
  commentsPerMinute: number;
  commentEditWindowMs: number;
  photoMaxBytes: number;
  photoMaxPixels: number;
  photosPerDay: number;
}

export const DEFAULT_COMMUNITY_LIMITS: CommunityLimits = {
  commentsPerMinute: COMMENTS_PER_MINUTE,
  commentEditWindowMs: COMMENT_EDIT_WINDOW_MS,
  photoMaxBytes: PHOTO_MAX_BYTES,
  photoMaxPixels: PHOTO_MAX_PIXELS,
  photosPerDay: PHOTOS_PER_DAY,
};
