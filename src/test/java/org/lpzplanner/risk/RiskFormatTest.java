package org.lpzplanner.risk;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/** How figures are written: powers of ten for small risks, plain digits for ordinary numbers. */
class RiskFormatTest {

    @Test
    void smallValuesAreWrittenInPowersOfTen() {
        assertThat(RiskFormat.scientific(1e-5)).isEqualTo("10⁻⁵");
        assertThat(RiskFormat.scientific(7.2997e-6)).isEqualTo("7.3 × 10⁻⁶");
        assertThat(RiskFormat.scientific(1.45994e-4)).isEqualTo("1.46 × 10⁻⁴");
        assertThat(RiskFormat.scientific(9.9996e-6)).isEqualTo("10⁻⁵");
        assertThat(RiskFormat.scientific(0)).isEqualTo("0");
    }

    @Test
    void ordinaryValuesAreWrittenPlain() {
        assertThat(RiskFormat.scientific(0.0144549)).isEqualTo("0.01445");
        assertThat(RiskFormat.scientific(0.5)).isEqualTo("0.5");
        assertThat(RiskFormat.area(7227.43)).isEqualTo("7227");
    }

    @Test
    void anErrorBoundIsRoundedUpSoItStaysABound() {
        // 1 − sin(1.5q)/(1.5q), q = π/96: 4.0106…·10⁻⁴, i.e. 0.040106… %
        double bound = 1 - Math.sin(1.5 * Math.PI / 96) / (1.5 * Math.PI / 96);
        assertThat(RiskFormat.percent(bound * 100)).isEqualTo("0.041");
    }
}
