package org.lpzplanner.design;

import java.util.ArrayList;
import java.util.List;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.common.Formats;
import org.lpzplanner.engine.design.AngleCoverage;
import org.lpzplanner.engine.design.AngleMethodCheck;
import org.lpzplanner.engine.design.MeshFaceResult;
import org.lpzplanner.engine.design.MeshMethodCheck;
import org.lpzplanner.engine.exposure.AnalysisResult;
import org.lpzplanner.engine.geom.SiteSurface;
import org.lpzplanner.engine.geom.SiteSurfaceBuilder;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.SphereSpec;
import org.lpzplanner.engine.model.Structure;
import org.lpzplanner.heavywork.HeavyWorkCapacity;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.springframework.stereotype.Service;

/**
 * Cross-checks the rolling sphere against the protective angle and mesh methods, per structure of a
 * stored site as it is now (see docs/design-checks.md): the design page's
 * table and its API. Nothing is stored. The rolling-sphere result is the site's analysis as it stands
 * ({@link AnalysisService#current}: taken over from the analysis kept in memory where the site is
 * unchanged since), within the instance's {@link HeavyWorkCapacity} and its time budget.
 */
@Service
public class MethodCheckService {

    private final SiteService sites;
    private final HeavyWorkCapacity capacity;
    private final AnalysisService analyses;

    public MethodCheckService(SiteService sites, HeavyWorkCapacity capacity, AnalysisService analyses) {
        this.sites = sites;
        this.capacity = capacity;
        this.analyses = analyses;
    }

    /** One structure's cross-check of the rolling sphere against the angle and mesh methods. */
    public record MethodCheck(String structureId, String name, int sphereExposedItems, double sphereExposedRoofArea,
            boolean angleCovered, double angleUncoveredArea, int meshFacesPassing, int meshFacesFailing,
            int meshFacesNotApplicable, String agreement, List<String> notes) {

        /** The exposed roof area as pages and report write an area. */
        public String sphereExposedRoofAreaText() {
            return Formats.area(sphereExposedRoofArea);
        }

        /** The roof area the angle method leaves uncovered, written as an area. */
        public String angleUncoveredAreaText() {
            return Formats.area(angleUncoveredArea);
        }
    }

    /**
     * @throws org.lpzplanner.heavywork.HeavyWorkBusyException when no place for long computations came
     *         free within the wait
     * @throws org.lpzplanner.heavywork.HeavyWorkOverBudgetException when the analysis ran past its budget
     */
    public List<MethodCheck> methodChecks(long siteId) {
        StoredSite stored = sites.get(siteId);
        Site site = sites.document(stored).site();
        return capacity.run("method check", () -> methodChecks(site, stored.sphere(),
                analyses.current(stored, site)));
    }

    private List<MethodCheck> methodChecks(Site site, SphereSpec sphere, AnalysisResult result) {
        SiteSurface surface = SiteSurfaceBuilder.build(site);
        List<MeshFaceResult> mesh = MeshMethodCheck.check(surface, sphere.level().meshSize());
        List<MethodCheck> out = new ArrayList<>();
        for (Structure s : site.structures()) {
            int items = (int) (result.edges().stream().filter(e -> e.ownerId().equals(s.id())).count()
                    + result.corners().stream().filter(c -> c.ownerId().equals(s.id())).count()
                    + result.facadePartsNeedingLateral().stream().filter(f -> f.band().ownerId().equals(s.id()))
                            .count());
            double roof = result.roofs().stream().filter(r -> r.ownerId().equals(s.id())).mapToDouble(r -> r.exposedPlanArea()).sum();
            AngleCoverage angle = AngleMethodCheck.check(surface, s.id(), sphere.radius());
            int pass = 0, fail = 0, na = 0;
            for (MeshFaceResult m : mesh) {
                if (m.ownerId().equals(s.id())) {
                    switch (m.status()) {
                        case PASS -> pass++;
                        case FAIL -> fail++;
                        default -> na++;
                    }
                }
            }
            boolean sphereProtected = items == 0 && roof == 0;
            String agreement;
            if (sphereProtected == angle.isCovered()) {
                agreement = sphereProtected ? "agree: protected" : "agree: not protected";
            } else if (angle.isCovered()) {
                agreement = "disagree: the angle method covers the roof, the rolling sphere still reaches parts of the structure";
            } else {
                agreement = "disagree: the rolling sphere finds the structure protected, the angle method leaves roof uncovered";
            }
            out.add(new MethodCheck(s.id(), s.name() == null ? s.id() : s.name(), items, Centimetres.round(roof),
                    angle.isCovered(), Centimetres.round(angle.uncoveredArea()), pass, fail, na, agreement,
                    angle.notes()));
        }
        return out;
    }
}
