package org.lpzplanner.engine.io;

import java.math.BigDecimal;
import java.math.RoundingMode;
import tools.jackson.databind.JsonNode;

/** Renders values for error messages: short, unambiguous and locale-independent. */
final class Texts {

    private static final int MAX_SHOWN = 40;

    private Texts() {}

    /** How a JSON value appears in a "got …" clause: strings quoted, containers named not dumped. */
    static String shown(JsonNode node) {
        if (node == null || node.isMissingNode()) {
            return "nothing";
        }
        if (node.isObject()) {
            return "an object";
        }
        if (node.isArray()) {
            return "an array";
        }
        if (node.isString()) {
            return quoted(node.stringValue());
        }
        if (node.isNumber() && !Double.isFinite(node.doubleValue())) {
            return Double.toString(node.doubleValue());
        }
        return node.toString();
    }

    /** A JSON value as written (compact), shortened if long; for positions and small arrays. */
    static String compact(JsonNode node) {
        if (node == null || node.isMissingNode()) {
            return "nothing";
        }
        String text = node.toString();
        return text.length() > MAX_SHOWN ? text.substring(0, MAX_SHOWN) + "…" : text;
    }

    /** Text in double quotes, shortened if long. */
    static String quoted(String text) {
        String shortened = text.length() > MAX_SHOWN ? text.substring(0, MAX_SHOWN) + "…" : text;
        return "\"" + shortened + "\"";
    }

    /** A number with at most {@code decimals} decimals and no trailing zeros, e.g. 12.5 or 3. */
    static String number(double value, int decimals) {
        if (!Double.isFinite(value)) {
            return Double.toString(value);
        }
        return BigDecimal.valueOf(value).setScale(decimals, RoundingMode.HALF_UP).stripTrailingZeros().toPlainString();
    }

    /** A length in metres to the centimetre. */
    static String metres(double value) {
        return number(value, 2);
    }
}
