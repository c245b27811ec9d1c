package org.lpzplanner.design;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.analysis.AnalysisStateCache;
import org.lpzplanner.engine.exposure.AnalysisOptions;
import org.lpzplanner.engine.exposure.AnalysisResult;
import org.lpzplanner.engine.exposure.AnalysisState;
import org.lpzplanner.engine.exposure.ExposureAnalysis;
import org.lpzplanner.engine.io.SiteReader;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;

/**
 * The method checks of a site just analysed take the rolling sphere's decisions over from the
 * analysis kept in memory instead of computing them again, and give what a fresh analysis of the
 * same file gives.
 */
@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class MethodCheckReuseTest {

    /** Two boxes side by side (WKT, ISO/IEC 13249-3): the lower one partly in the taller one's shelter. */
    private static final String FILE = "POLYGON ((0 0, 12 0, 12 8, 0 8, 0 0)) 6\n"
            + "POLYGON ((14 0, 24 0, 24 8, 14 8, 14 0)) 15\n";

    @Autowired
    SiteService sites;
    @Autowired
    AnalysisService analyses;
    @Autowired
    AnalysisStateCache kept;
    @Autowired
    MethodCheckService methodChecks;

    @Test
    void theMethodChecksOfAnAnalysedSiteReuseItsKeptDecisionsAndAgreeWithAFreshAnalysis() {
        long id = sites.create("pair.wkt", FILE.getBytes(), "Reused pair", null, null).id();
        analyses.run(id, "", "", "");
        StoredSite site = sites.get(id);
        AnalysisState before = kept.closest(id, site.version()).orElseThrow();

        List<MethodCheckService.MethodCheck> checks = methodChecks.methodChecks(id);

        AnalysisState after = kept.closest(id, site.version()).orElseThrow();
        assertThat(after).isNotSameAs(before);
        // nothing decided again: the roof decisions are the kept analysis's own objects
        for (int k = 0; k < before.result().roofs().size(); k++) {
            assertThat(after.result().roofs().get(k)).isSameAs(before.result().roofs().get(k));
        }
        AnalysisResult fresh = ExposureAnalysis.analyze(SiteReader.readWkt(FILE, "pair.wkt").site(),
                AnalysisOptions.of(site.sphere()));
        assertThat(checks).hasSize(2);
        for (MethodCheckService.MethodCheck check : checks) {
            String owner = check.structureId();
            long items = fresh.edges().stream().filter(e -> e.ownerId().equals(owner)).count()
                    + fresh.corners().stream().filter(c -> c.ownerId().equals(owner)).count()
                    + fresh.facadePartsNeedingLateral().stream().filter(f -> f.band().ownerId().equals(owner)).count();
            double roof = fresh.roofs().stream().filter(r -> r.ownerId().equals(owner))
                    .mapToDouble(r -> r.exposedPlanArea()).sum();
            assertThat(check.sphereExposedItems()).as(owner).isEqualTo((int) items);
            assertThat(check.sphereExposedRoofArea()).as(owner).isEqualTo(Centimetres.round(roof));
        }
    }
}
