package org.lpzplanner.comments;

import java.time.Instant;

/** An analysis revision marked reviewed by {@code reviewer} at {@code at}. */
public record RevisionReview(int revision, String reviewer, Instant at) {
}
