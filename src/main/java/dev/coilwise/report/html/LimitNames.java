package dev.coilwise.report.html;

/** The trade's words for each limit key of an evaluation. */
final class LimitNames {
    private LimitNames() {
    }

    /** Keys of the ranking rules that can empty a shortlist after the search found feasible designs. */
    static final java.util.Set<String> RANKING_RULES = java.util.Set.of("min_probability", "dynamics");

    static String of(String key, boolean arrest) {
        return switch (key) {
            case "stroke" -> arrest ? "stroke" : "cocking stroke";
            case "peak_force" -> arrest ? "peak force" : "cocking force";
            case "deceleration" -> "deceleration";
            case "pocket" -> "free length over pocket";
            case "coil_bind" -> "coil-bind clearance";
            case "stress_working" -> arrest ? "stress at peak" : "stress when cocked";
            case "stress_solid" -> "stress at solid";
            case "index" -> "spring index";
            case "active_coils" -> "active coils";
            case "fit_bore" -> "fit in bore";
            case "fit_rod" -> "fit over rod";
            case "free_length" -> "free length";
            case "buckling" -> "buckling";
            case "surge" -> "surge";
            case "fatigue" -> "fatigue life";
            case "min_probability" -> "share made within limits (ranking.min_probability)";
            case "dynamics" -> "simulated figures over a limit (ranking.dynamics: strict)";
            default -> key.replace('_', ' ');
        };
    }
}
