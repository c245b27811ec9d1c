package org.lpzplanner.common;

import static org.assertj.core.api.Assertions.assertThat;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.Locale;
import java.util.Random;
import java.util.function.DoubleFunction;
import org.junit.jupiter.api.Test;
import org.lpzplanner.engine.model.ProtectionLevel;

/**
 * The quantity formats, checked against an independent reader: {@link BigDecimal}'s exact decimal
 * expansion of the value, rounded half up.
 */
class FormatsTest {

    private static final Random RANDOM = new Random(20261205L);

    /** The exact value of {@code value} rounded half up to {@code places} decimals, written plainly. */
    private static String reference(double value, int places) {
        BigDecimal rounded = new BigDecimal(value).setScale(places, RoundingMode.HALF_UP);
        return rounded.signum() == 0 ? rounded.abs().toPlainString() : rounded.toPlainString();
    }

    private static double sample() {
        double magnitude = Math.pow(10, RANDOM.nextInt(7) - 3);
        return (RANDOM.nextDouble() * 2 - 1) * magnitude;
    }

    @Test
    void centimetreQuantitiesRoundHalfUpToTwoDecimals() {
        for (DoubleFunction<String> format : java.util.List.<DoubleFunction<String>>of(Formats::length,
                Formats::height, Formats::area, Formats::coordinate)) {
            for (int i = 0; i < 5000; i++) {
                double v = sample();
                assertThat(format.apply(v)).as("%s", v).isEqualTo(reference(v, 2));
            }
        }
    }

    /**
     * A printed separation check must not look better than the computed one: the required distance
     * is never printed below its value, the available one never above (both within 1 mm, and to
     * within 1e-9 m of float noise, far below any measurement).
     */
    @Test
    void separationDistancesPrintOnTheSafeSide() {
        BigDecimal noise = new BigDecimal("1e-9");
        BigDecimal millimetre = new BigDecimal("0.001");
        for (int i = 0; i < 5000; i++) {
            double v = Math.abs(sample());
            BigDecimal exact = new BigDecimal(v);
            BigDecimal required = new BigDecimal(Formats.requiredSeparation(v));
            BigDecimal available = new BigDecimal(Formats.availableSeparation(v));
            assertThat(required.scale()).isEqualTo(3);
            assertThat(required.add(noise)).as("required %s", v).isGreaterThanOrEqualTo(exact);
            assertThat(required.subtract(exact)).isLessThanOrEqualTo(millimetre);
            assertThat(available.subtract(noise)).as("available %s", v).isLessThanOrEqualTo(exact);
            assertThat(exact.subtract(available)).isLessThanOrEqualTo(millimetre);
        }
        assertThat(Formats.requiredSeparation(0.4512)).isEqualTo("0.452");
        assertThat(Formats.availableSeparation(0.4578)).isEqualTo("0.457");
        assertThat(Formats.requiredSeparation(0.452)).isEqualTo("0.452");
    }

    @Test
    void trimmedQuantitiesAreTheRoundedValueWithoutTrailingZeros() {
        for (int i = 0; i < 5000; i++) {
            double v = sample();
            String radius = Formats.radius(v);
            assertThat(new BigDecimal(radius)).as("%s", v).isEqualByComparingTo(reference(v, 1));
            assertThat(radius).doesNotEndWith(".").satisfiesAnyOf(r -> assertThat(r).doesNotContain("."),
                    r -> assertThat(r).doesNotEndWith("0"));
            assertThat(Formats.percent(v)).isEqualTo(radius);
            assertThat(Formats.oneDecimal(v)).isEqualTo(radius);
            String step = Formats.scaleStep(v);
            assertThat(new BigDecimal(step)).as("%s", v).isEqualByComparingTo(reference(v, 2));
        }
    }

    @Test
    void theLevelsRadiiPrintAsWholeMetres() {
        // IEC 62305-3 Table 2 gives whole metres: no decimals on any output
        for (ProtectionLevel level : ProtectionLevel.values()) {
            String radius = Formats.radius(level.sphereRadius());
            assertThat(radius).doesNotContain(".");
            assertThat(Double.parseDouble(radius)).isEqualTo(level.sphereRadius());
        }
    }

    @Test
    void aValueThatRoundsToZeroHasNoMinusSign() {
        assertThat(Formats.coordinate(-0.004)).isEqualTo(Formats.coordinate(0.004)).isEqualTo(reference(0, 2));
        assertThat(Formats.length(-0.0)).isEqualTo(Formats.length(0.0));
        assertThat(Formats.radius(-0.04)).isEqualTo(Formats.radius(0.0));
        assertThat(Formats.coordinate(-0.006)).startsWith("-");
    }

    @Test
    void theDecimalSeparatorIsADotWhateverTheLocale() {
        Locale before = Locale.getDefault();
        try {
            Locale.setDefault(Locale.GERMANY);
            assertThat(Formats.length(12.345)).isEqualTo(reference(12.345, 2)).doesNotContain(",");
            assertThat(Formats.area(1234.5)).isEqualTo(reference(1234.5, 2)).doesNotContain(",");
            assertThat(Formats.radius(45.5)).isEqualTo(reference(45.5, 1));
        } finally {
            Locale.setDefault(before);
        }
    }
}
