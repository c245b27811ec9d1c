package org.lpzplanner.engine.design;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

class AngleMethodCheckTest {

    @Test
    void rodInTheMiddleCoversASmallRoof() {
        // 5 m rod at class I: reach at roof level 5 · tan α(5) ≈ 8.6 m (closed form), corners 2.9 m away
        Structure b = DesignSites.flatBuilding(DesignSites.rectangle(0, 0, 4, 4), 6);
        Site site = DesignSites.site(b, List.of(new Rod("r", "Rod", 2, 2, 5)), List.of());
        AngleCoverage c = AngleMethodCheck.check(site, ProtectionLevel.I).get(0);
        assertThat(c.isCovered()).isTrue();
        assertThat(c.uncoveredArea()).isZero();
        assertThat(c.sampledPoints()).isGreaterThan(64);
    }

    @Test
    void shortRodOnALargeRoofLeavesEverythingOutsideItsCircleUncovered() {
        // 2 m rod at class I: circle of radius 2 · tan α(2) at roof level (closed form); the rest of 40 × 20 m is
        // uncovered; grid error about circle length × spacing ≈ 18 m²
        Structure b = DesignSites.flatBuilding(DesignSites.rectangle(0, 0, 40, 20), 6);
        Site site = DesignSites.site(b, List.of(new Rod("r", "Rod", 20, 10, 2)), List.of());
        AngleCoverage c = AngleMethodCheck.check(site, ProtectionLevel.I).get(0);
        double reach = 2 * ProtectiveAngle.tangent(20, 2);
        assertThat(c.isCovered()).isFalse();
        assertThat(c.uncoveredArea()).isCloseTo(800 - Math.PI * reach * reach, within(20.0));
        assertThat(c.uncoveredPoints()).allMatch(p -> Math.hypot(p.x - 20, p.y - 10) > reach - 1e-9);
    }

    @Test
    void mastOnTheGroundCoversALowRoofBesideIt() {
        // 20 m mast at class IV: α(20) ≈ 54.0° (closed form); 17 m below the tip the cone reaches ≈ 23 m
        Structure b = DesignSites.flatBuilding(DesignSites.rectangle(0, 0, 10, 6), 3);
        Site site = DesignSites.site(b, List.of(new Rod("m", "Mast", -1, 3, 20)), List.of());
        assertThat(AngleMethodCheck.check(site, ProtectionLevel.IV).get(0).isCovered()).isTrue();
        // the same mast at class I stands 20 m = R high: α = 23.2°, 17 · tan 23.2° ≈ 7.3 m < 11.4 m to the far corners
        assertThat(AngleMethodCheck.check(site, ProtectionLevel.I).get(0).isCovered()).isFalse();
    }

    @Test
    void rodTallerThanTheSphereRadiusIsLeftOutWithANote() {
        Structure b = DesignSites.flatBuilding(DesignSites.rectangle(0, 0, 4, 4), 6);
        Site site = DesignSites.site(b, List.of(new Rod("tall", "Tall rod", 2, 2, 25)), List.of());
        AngleCoverage c = AngleMethodCheck.check(site, ProtectionLevel.I).get(0);
        assertThat(c.isCovered()).isFalse();
        assertThat(c.notes()).singleElement().asString().contains("tall").contains("does not apply");
    }

    @Test
    void parapetTopIsTestedAtItsOwnHeight() {
        // 1 m parapet on a 4.2 × 4.2 m roof; a 2 m rod at the centre reaches 1 m · tan α(2) ≈ 2.85 m at parapet
        // level (closed form), less than the 2.97 m to the corners, so only the parapet's corners are uncovered
        Structure b = new Structure("b", "Hall", DesignSites.rectangle(0, 0, 4.2, 4.2), 6,
                new org.lpzplanner.engine.model.RoofShape.Flat(1));
        Site site = DesignSites.site(b, List.of(new Rod("r", "Rod", 2.1, 2.1, 2)), List.of());
        AngleCoverage c = AngleMethodCheck.check(site, ProtectionLevel.I).get(0);
        assertThat(c.isCovered()).isFalse();
        assertThat(c.uncoveredPoints()).allMatch(p -> p.getZ() == 7.0);
        assertThat(c.uncoveredArea()).isZero();
    }
}
