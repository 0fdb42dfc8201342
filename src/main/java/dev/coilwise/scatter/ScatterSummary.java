package dev.coilwise.scatter;

import dev.coilwise.error.Check;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * What manufacturing scatter does to one design: the share of made springs that still meet the requirement and the
 * 1st and 99th percentiles of its working figures. Percentile maps are keyed like the design's JSON figures (e.g.
 * {@code peak_force_N}, {@code predicted_height_mm}) and hold values in the unit the key names, in a fixed order.
 *
 * @param samples       made springs drawn
 * @param seed          seed of the random generator
 * @param probabilityOk share of made springs meeting the requirement (see {@link MonteCarlo}), 0..1
 * @param p01           1st percentile of each figure
 * @param p99           99th percentile of each figure
 */
public record ScatterSummary(int samples, long seed, double probabilityOk, Map<String, Double> p01,
                             Map<String, Double> p99) {
    public ScatterSummary {
        Check.positive("Monte Carlo samples", samples, "");
        Check.inRange("probability", probabilityOk, 0, 1, "");
        p01 = Collections.unmodifiableMap(new LinkedHashMap<>(p01));
        p99 = Collections.unmodifiableMap(new LinkedHashMap<>(p99));
    }
}
