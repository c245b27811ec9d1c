package org.lpzplanner.risk;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.Locale;

/** How risk figures are written on the page, in the API's texts and in the report. */
final class RiskFormat {

    private static final String SUPERSCRIPTS = "⁰¹²³⁴⁵⁶⁷⁸⁹";

    private RiskFormat() {
    }

    /**
     * Three significant digits, in powers of ten below 0.01 and above 9999, e.g. "2.51 × 10⁻⁶" or
     * "10⁻⁵"; "0" for zero.
     */
    static String scientific(double value) {
        if (value == 0) {
            return "0";
        }
        int exponent = (int) Math.floor(Math.log10(Math.abs(value)));
        double mantissa = value / Math.pow(10, exponent);
        if (Math.abs(mantissa) >= 9.995) {
            mantissa /= 10;
            exponent++;
        }
        if (exponent >= -2 && exponent <= 3) {
            return significant(value);
        }
        String digits = new BigDecimal(mantissa).round(new MathContext(3)).stripTrailingZeros()
                .toPlainString();
        return ("1".equals(digits) ? "" : digits + " × ") + "10" + superscript(exponent);
    }

    /** Up to four significant digits without a power of ten, e.g. "0.0251" or "10030". */
    static String significant(double value) {
        if (value == 0) {
            return "0";
        }
        return new BigDecimal(value).round(new MathContext(4)).stripTrailingZeros().toPlainString();
    }

    /** A small percentage to two significant digits, rounded up (a bound stays a bound), e.g. "0.041". */
    static String percent(double value) {
        return new BigDecimal(value).round(new MathContext(2, RoundingMode.UP))
                .stripTrailingZeros().toPlainString();
    }

    /** Whole square metres, e.g. "10027". */
    static String area(double squareMetres) {
        return String.format(Locale.ROOT, "%.0f", squareMetres);
    }

    private static String superscript(int exponent) {
        StringBuilder out = new StringBuilder(exponent < 0 ? "⁻" : "");
        for (char c : String.valueOf(Math.abs(exponent)).toCharArray()) {
            out.append(SUPERSCRIPTS.charAt(c - '0'));
        }
        return out.toString();
    }
}
