package org.lpzplanner.comments;

import java.time.Instant;

/** A comment on a site; {@code body} is user text, escape it when shown. */
public record SiteComment(long id, long siteId, String author, String body, Instant at) {
}
