package org.lpzplanner.sites;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.lpzplanner.engine.io.SiteDocument;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.springframework.transaction.support.TransactionSynchronizationManager;
import org.springframework.transaction.support.TransactionSynchronizationUtils;

/**
 * The parsed site files kept by site and version: a version is read once, a document is only ever
 * served for the text it was read from, and what a transaction wrote is kept only once it commits.
 */
class ParsedSitesTest {

    private static final String WAREHOUSE = sample("harbour-warehouse.geojson");
    private static final String HALL = sample("millbrook-hall.geojson");

    private static String sample(String name) {
        try {
            return Files.readString(Path.of("sample-sites", name));
        } catch (java.io.IOException e) {
            throw new IllegalStateException(e);
        }
    }

    private static StoredSite site(long id, long version, String name, String text) {
        Instant at = Instant.parse("2026-01-01T00:00:00Z");
        return new StoredSite(id, "Site " + id, ProtectionLevel.II, null, name, text, at, at, version, null, null);
    }

    @AfterEach
    void noTransactionLeftOpen() {
        if (TransactionSynchronizationManager.isSynchronizationActive()) {
            TransactionSynchronizationManager.clearSynchronization();
        }
    }

    @Test
    void aVersionIsReadOnceAndServedAgainAsTheSameDocument() {
        ParsedSites parsed = new ParsedSites(4);
        StoredSite site = site(1, 3, "harbour-warehouse.geojson", WAREHOUSE);

        SiteDocument first = parsed.document(site);
        SiteDocument again = parsed.document(site);

        assertThat(again).isSameAs(first);
        // what the cache serves is what reading the file gives
        assertThat(first.site().structures()).hasSameSizeAs(
                SiteFiles.read(WAREHOUSE, "harbour-warehouse.geojson").site().structures());
    }

    @Test
    void aVersionWithOtherTextIsReadAgainFromThatText() {
        ParsedSites parsed = new ParsedSites(4);
        SiteDocument warehouse = parsed.document(site(1, 3, "harbour-warehouse.geojson", WAREHOUSE));

        // the same id and version with other text (a write that was rolled back, then written again)
        SiteDocument hall = parsed.document(site(1, 3, "millbrook-hall.geojson", HALL));

        assertThat(hall).isNotSameAs(warehouse);
        assertThat(hall.site().structures().stream().map(s -> s.name()).toList())
                .isEqualTo(SiteFiles.read(HALL, "millbrook-hall.geojson").site().structures().stream()
                        .map(s -> s.name()).toList())
                .isNotEqualTo(warehouse.site().structures().stream().map(s -> s.name()).toList());
    }

    @Test
    void whatATransactionWroteIsKeptOnlyOnceItCommits() {
        ParsedSites parsed = new ParsedSites(4);
        SiteDocument read = SiteFiles.read(WAREHOUSE, "harbour-warehouse.geojson");

        TransactionSynchronizationManager.initSynchronization();
        parsed.keepAfterCommit(1, 4, WAREHOUSE, read);
        assertThat(parsed.size()).isZero();
        // rolled back: the synchronizations are dropped without a commit
        TransactionSynchronizationManager.clearSynchronization();
        assertThat(parsed.size()).isZero();
        assertThat(parsed.document(site(1, 4, "harbour-warehouse.geojson", WAREHOUSE))).isNotSameAs(read);

        TransactionSynchronizationManager.initSynchronization();
        parsed.keepAfterCommit(1, 5, WAREHOUSE, read);
        TransactionSynchronizationUtils.triggerAfterCommit();
        TransactionSynchronizationManager.clearSynchronization();
        assertThat(parsed.document(site(1, 5, "harbour-warehouse.geojson", WAREHOUSE))).isSameAs(read);
    }

    @Test
    void theAnalysisMarkingTheSiteCarriesTheDocumentToTheNextVersionOfTheSameText() {
        ParsedSites parsed = new ParsedSites(4);
        SiteDocument read = parsed.document(site(1, 5, "harbour-warehouse.geojson", WAREHOUSE));

        parsed.carryAfterCommit(1, 5, 6, WAREHOUSE);
        parsed.carryAfterCommit(1, 6, 7, HALL);

        assertThat(parsed.document(site(1, 6, "harbour-warehouse.geojson", WAREHOUSE))).isSameAs(read);
        // not carried to a version of other text
        assertThat(parsed.document(site(1, 7, "millbrook-hall.geojson", HALL))).isNotSameAs(read);
    }

    @Test
    void theLeastRecentlyUsedGoFirstADeletedSiteGoesAndNoneAreKeptAtCapacityZero() {
        ParsedSites parsed = new ParsedSites(2);
        SiteDocument one = parsed.document(site(1, 1, "harbour-warehouse.geojson", WAREHOUSE));
        parsed.document(site(2, 1, "harbour-warehouse.geojson", WAREHOUSE));
        parsed.document(site(1, 1, "harbour-warehouse.geojson", WAREHOUSE)); // site 1 used last
        parsed.document(site(3, 1, "harbour-warehouse.geojson", WAREHOUSE)); // site 2 goes
        assertThat(parsed.size()).isEqualTo(2);
        assertThat(parsed.document(site(1, 1, "harbour-warehouse.geojson", WAREHOUSE))).isSameAs(one);

        parsed.forget(1);
        assertThat(parsed.size()).isEqualTo(1);
        assertThat(parsed.document(site(1, 1, "harbour-warehouse.geojson", WAREHOUSE))).isNotSameAs(one);

        ParsedSites none = new ParsedSites(0);
        StoredSite site = site(1, 1, "harbour-warehouse.geojson", WAREHOUSE);
        assertThat(none.document(site)).isNotSameAs(none.document(site));
        assertThat(none.size()).isZero();
    }
}
