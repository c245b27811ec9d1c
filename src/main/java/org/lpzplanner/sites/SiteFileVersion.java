package org.lpzplanner.sites;

import java.time.Instant;

/**
 * A site file that a correction replaced, kept verbatim.
 *
 * @param number     1 for the first file replaced, then counting up per site
 * @param sourceName the file's name
 * @param sourceText the file's content, exactly as it was stored
 * @param replacedAt when the correction replaced it
 */
public record SiteFileVersion(int number, String sourceName, String sourceText, Instant replacedAt) {
}
