package org.lpzplanner.sites;

/**
 * Published inside the transaction that stores a copy of a site, so that each feature copies the
 * data it keeps for the site (risk inputs, down-conductors, cuts, keep-out areas) in the same
 * transaction, without the sites package knowing those tables.
 *
 * @param from the site copied
 * @param to   the new copy, same file and therefore the same local frame
 */
public record SiteDuplicated(long from, long to) {
}
