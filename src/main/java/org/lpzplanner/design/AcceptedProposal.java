package org.lpzplanner.design;

import java.util.List;

/**
 * Ids of the parts an accepted proposal added to the site, and the site's version after accepting
 * (the version its undo must send). Stored with the proposal's job, so any instance can undo it.
 */
public record AcceptedProposal(List<String> rodIds, List<String> conductorIds, long version) {
}
