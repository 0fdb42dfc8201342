package dev.coilwise.report;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.math.BigDecimal;
import java.math.MathContext;

/** Shared JSON settings: plain decimals rounded to six significant digits, so output is stable and readable. */
public final class Json {
    public static final ObjectMapper MAPPER = new ObjectMapper()
            .enable(SerializationFeature.INDENT_OUTPUT)
            .enable(JsonGenerator.Feature.WRITE_BIGDECIMAL_AS_PLAIN);

    /** Significant digits kept in JSON and CSV figures. */
    public static final int DIGITS = 6;

    private Json() {
    }

    /** Rounds to {@link #DIGITS} significant digits; null for NaN and infinities. */
    public static BigDecimal num(double v) {
        if (!Double.isFinite(v)) {
            return null;
        }
        if (v == 0) {
            return BigDecimal.ZERO;
        }
        BigDecimal b = new BigDecimal(v).round(new MathContext(DIGITS)).stripTrailingZeros();
        return b.scale() < 0 ? b.setScale(0) : b;
    }

    public static void put(ObjectNode n, String key, double v) {
        BigDecimal b = num(v);
        if (b == null) {
            n.putNull(key);
        } else {
            n.put(key, b);
        }
    }
}
