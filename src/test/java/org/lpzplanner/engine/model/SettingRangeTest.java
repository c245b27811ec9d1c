package org.lpzplanner.engine.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;
import org.lpzplanner.engine.exposure.AnalysisOptions;

/**
 * The ranges of the radius and the resolution, stated once and held by the engine's own value
 * types. The bounds are the product's choice (see {@link SettingRange}), not values of a standard.
 */
class SettingRangeTest {

    @Test
    void radiusIsOneMetreToOneKilometreBothIncluded() {
        assertThat(SettingRange.RADIUS.contains(0)).isFalse();
        assertThat(SettingRange.RADIUS.contains(1e-4)).isFalse();
        assertThat(SettingRange.RADIUS.contains(0.999)).isFalse();
        assertThat(SettingRange.RADIUS.contains(1)).isTrue();
        // every level's radius, IEC 62305-3:2010 Table 2: 20, 30, 45, 60 m
        for (double r : new double[] {20, 30, 45, 60}) {
            assertThat(SettingRange.RADIUS.contains(r)).isTrue();
        }
        assertThat(SettingRange.RADIUS.contains(1000)).isTrue();
        assertThat(SettingRange.RADIUS.contains(1000.001)).isFalse();
        assertThat(SettingRange.RADIUS.rule()).isEqualTo("between 1 and 1000 m");
    }

    @Test
    void resolutionIsFiveCentimetresToTenMetresBothIncluded() {
        assertThat(SettingRange.RESOLUTION.contains(0.049)).isFalse();
        assertThat(SettingRange.RESOLUTION.contains(0.05)).isTrue();
        assertThat(SettingRange.RESOLUTION.contains(10)).isTrue();
        assertThat(SettingRange.RESOLUTION.contains(10.01)).isFalse();
        assertThat(SettingRange.RESOLUTION.rule()).isEqualTo("between 0.05 and 10 m");
    }

    @Test
    void notANumberAndInfinitiesAreNeverInRange() {
        for (SettingRange range : SettingRange.values()) {
            assertThat(range.contains(Double.NaN)).isFalse();
            assertThat(range.contains(Double.POSITIVE_INFINITY)).isFalse();
            assertThat(range.contains(Double.NEGATIVE_INFINITY)).isFalse();
        }
    }

    @Test
    void sphereAndAnalysisOptionsRefuseWhatTheRangesRefuse() {
        assertThat(new SphereSpec(ProtectionLevel.II, 1000).radius()).isEqualTo(1000);
        assertThatThrownBy(() -> new SphereSpec(ProtectionLevel.II, 1000.5)).hasMessageContaining("between 1 and 1000 m");
        assertThatThrownBy(() -> new SphereSpec(ProtectionLevel.II, 0.5)).hasMessageContaining("between 1 and 1000 m");
        SphereSpec sphere = SphereSpec.of(ProtectionLevel.II);
        assertThat(AnalysisOptions.of(sphere).withResolution(0.05).resolution()).isEqualTo(0.05);
        assertThatThrownBy(() -> AnalysisOptions.of(sphere).withResolution(0.04))
                .hasMessageContaining("between 0.05 and 10 m");
    }
}
