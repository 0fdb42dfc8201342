package dev.coilwise.report.html;

import dev.coilwise.model.Gravity;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;

/**
 * One shortlisted design as the report shows it. SI throughout.
 *
 * @param rank             1-based rank
 * @param stock            the catalogue part, for a stock design (empty: a custom design to be made)
 * @param material         material key
 * @param materialStandard the wire standard, e.g. ASTM A228
 * @param ends             end type key
 * @param geometry         the spring as ordered
 * @param working          its working figures for the job
 * @param margins          every limit checked
 * @param testLoads        test loads for the spring maker (F1, F2) with their EN 15800 tolerances
 * @param fatigueFactor    fatigue safety factor, when a cycle life was asked for (NaN otherwise)
 * @param probabilityOk    share of springs made to the tolerances that meet every limit (NaN when not computed)
 * @param simulation       the time-domain check, when it was run
 */
public record ReportDesign(int rank, Optional<Stock> stock, String material, String materialStandard, String ends,
                           Geometry geometry, Working working, List<ReportMargin> margins, List<TestLoad> testLoads,
                           double fatigueFactor, double probabilityOk, Optional<SimulationView> simulation) {
    public ReportDesign {
        margins = List.copyOf(margins);
        testLoads = List.copyOf(testLoads);
    }

    /**
     * A catalogue part.
     *
     * @param partNumber part number
     * @param supplier   supplier
     * @param unitPrice  price per piece (NaN when not stated)
     * @param currency   currency of the price
     */
    public record Stock(String partNumber, String supplier, double unitPrice, String currency) {
    }

    /**
     * A test load: the force the spring must give at a stated length.
     *
     * @param name      F1 or F2
     * @param length    test length, m
     * @param force     nominal force, N
     * @param tolerance ± force tolerance, N
     * @param grade     EN 15800 grade of the tolerance
     */
    public record TestLoad(String name, double length, double force, double tolerance, int grade) {
    }

    /**
     * The spring as ordered.
     *
     * @param wireDiameter  d, m
     * @param meanDiameter  D, m
     * @param outerDiameter OD, m
     * @param innerDiameter ID, m
     * @param index         C = D/d
     * @param activeCoils   Na
     * @param totalCoils    Nt
     * @param freeLength    L0, m
     * @param solidLength   Ls, m
     * @param pitch         p, m
     */
    public record Geometry(double wireDiameter, double meanDiameter, double outerDiameter, double innerDiameter,
                           double index, double activeCoils, double totalCoils, double freeLength, double solidLength,
                           double pitch) {
        /** Deflection from free length to solid, L0 − Ls, m. */
        public double deflectionToSolid() {
            return freeLength - solidLength;
        }
    }

    /**
     * Working figures (massless energy balance).
     *
     * @param rate                 k, N/m
     * @param mass                 spring mass, kg
     * @param preloadForce         force at the installed length, N (0 without a pocket)
     * @param preloadDeflection    L0 − installed length, m
     * @param workingDeflection    arrest: largest compression from contact; launch: cocked compression, m
     * @param totalDeflection      preload + working deflection, m
     * @param peakForce            arrest: peak force; launch: cocking force, N
     * @param peakDeceleration     arrest: peak deceleration, m/s² (NaN for a launch)
     * @param speed                arrest: contact speed; launch: exit speed, m/s
     * @param predictedHeight      launch: apex rise above the muzzle, m (NaN for an arrest)
     * @param stressAtWorking      corrected stress at peak or cocked, Pa
     * @param stressAtSolid        corrected stress at solid, Pa
     * @param tensileStrength      Sut, Pa
     * @param allowableStress      static allowable torsional stress, Pa
     * @param outerDiameterAtSolid OD at solid, m
     * @param criticalDeflection   buckling deflection, m (+∞: stable)
     * @param naturalFrequency     fixed-fixed natural frequency, Hz
     * @param surgeSpeedLimit      end speed whose surge stress reaches the allowable, m/s
     */
    public record Working(double rate, double mass, double preloadForce, double preloadDeflection,
                          double workingDeflection, double totalDeflection, double peakForce, double peakDeceleration,
                          double speed, double predictedHeight, double stressAtWorking, double stressAtSolid,
                          double tensileStrength, double allowableStress, double outerDiameterAtSolid,
                          double criticalDeflection, double naturalFrequency, double surgeSpeedLimit) {
    }

    /** The binding limit: the hard margin with the least to spare. */
    public Optional<ReportMargin> binding() {
        return margins.stream().filter(ReportMargin::hard).min(Comparator.comparingDouble(ReportMargin::value));
    }

    public Optional<ReportMargin> margin(String key) {
        return margins.stream().filter(m -> m.key().equals(key)).findFirst();
    }

    /**
     * Energy the spring takes up over the working deflection, J: ½k(x₁² − x₀²) from the installed deflection x₀ to the
     * largest deflection x₁ (for a launch x₀ = 0: the energy stored when cocked).
     */
    public double workingEnergy() {
        double x0 = working.preloadDeflection();
        double x1 = working.totalDeflection();
        return 0.5 * working.rate() * (x1 * x1 - x0 * x0);
    }

    static ReportDesign from(JsonIn d, boolean arrest) {
        Geometry g = new Geometry(d.mm("wire_diameter_mm"), d.mm("mean_diameter_mm"), d.mm("outer_diameter_mm"),
                d.mm("inner_diameter_mm"), d.number("index"), d.number("active_coils"), d.number("total_coils"),
                d.mm("free_length_mm"), d.mm("solid_length_mm"), d.mm("pitch_mm"));
        double work = d.mm(arrest ? "max_compression_mm" : "cocked_compression_mm");
        double preloadDefl = d.mm("preload_deflection_mm");
        double critical = d.mm("critical_deflection_mm");
        Working w = new Working(d.number("rate_N_per_mm") * 1e3, d.number("mass_g") * 1e-3, d.number("preload_N"),
                preloadDefl, work, arrest ? d.mm("total_deflection_mm") : preloadDefl + work,
                d.number(arrest ? "peak_force_N" : "cocking_force_N"),
                arrest ? d.number("peak_deceleration_gn") * Gravity.STANDARD : Double.NaN,
                d.number(arrest ? "contact_speed_m_per_s" : "exit_speed_m_per_s"),
                arrest ? Double.NaN : d.mm("predicted_height_mm"),
                d.number(arrest ? "stress_at_peak_MPa" : "stress_at_cocked_MPa") * 1e6,
                d.number("stress_at_solid_MPa") * 1e6, d.number("tensile_strength_MPa") * 1e6,
                d.number("allowable_stress_MPa") * 1e6, d.mm("outer_diameter_at_solid_mm"),
                Double.isNaN(critical) ? Double.POSITIVE_INFINITY : critical, d.number("natural_frequency_Hz"),
                d.number("surge_speed_limit_m_per_s"));
        List<ReportMargin> margins = new ArrayList<>();
        d.objects("margins").forEach(m -> margins.add(ReportMargin.from(m)));
        List<TestLoad> loads = new ArrayList<>();
        if (d.has("test_loads")) {
            d.objects("test_loads").forEach(t -> loads.add(new TestLoad(t.text("name"), t.mm("length_mm"),
                    t.number("force_N"), t.number("force_tolerance_N"), t.integer("grade"))));
        }
        Optional<Stock> stock = "stock".equals(d.text("source", "custom"))
                ? Optional.of(new Stock(d.text("part_number", ""), d.text("supplier", ""),
                        d.optionalNumber("unit_price"), d.text("currency", "")))
                : Optional.empty();
        return new ReportDesign(d.integer("rank"), stock, d.text("material"), d.text("material_standard", ""),
                d.text("ends"), g, w, margins, loads,
                d.optionalObject("fatigue").map(f -> f.number("safety_factor")).orElse(Double.NaN),
                d.optionalObject("scatter").map(f -> f.number("probability_ok")).orElse(Double.NaN),
                d.optionalObject("simulation").map(SimulationView::from));
    }
}
