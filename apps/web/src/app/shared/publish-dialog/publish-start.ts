import { ENTRY_TITLE_MAX, type DesignEntryLink } from '@barwright/contracts';

/** Which design to publish, and what to start the form with when it was never published. */
export interface PublishRequest {
  designId: string;
  title: string;
  description?: string;
  tags?: readonly string[];
}

/** What the publish form starts with, and the revision a republish will add. */
export interface PublishStart {
  title: string;
  description: string;
  tags: string[];
  /** Set when the design was published before: the revision this publish adds to which entry. */
  revision: { next: number; entryTitle: string } | null;
}

/**
 * The form's first values (pure): a design published before starts from its entry's words, so a
 * new revision does not wipe the description and tags; a first publish starts from the request.
 */
export function publishStart(request: PublishRequest, link: DesignEntryLink | null): PublishStart {
  if (!link) {
    return { title: request.title.slice(0, ENTRY_TITLE_MAX), description: request.description ?? '', tags: [...(request.tags ?? [])], revision: null };
  }
  return {
    title: link.title,
    description: link.description,
    tags: [...link.tags],
    revision: { next: link.latestRevision + 1, entryTitle: link.title },
  };
}
