package dev.coilwise.dynamics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.Clearance;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Envelope;
import dev.coilwise.model.Job;
import dev.coilwise.model.Launch;
import dev.coilwise.model.Limits;
import dev.coilwise.model.Ranking;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Seating;
import dev.coilwise.model.Spring;
import dev.coilwise.model.SpringOptions;
import dev.coilwise.model.UnitSystem;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/**
 * The rules of {@code ranking.dynamics: strict}: the simulated figures against the requirement's hard limits, on a
 * real drop and on figures set around the balance of the test spring (d 3 mm, D 24 mm, Na 10, L0 80 mm, closed and
 * ground: Ls = (Na + 2)·d = 36 mm, so 44 mm to solid; solid length of closed-ground ends, Shigley's MED 9th ed.,
 * Table 10-1, from memory).
 */
class SimulatedLimitsTest {
    private static final Spring SPRING = Fixtures.spring();
    private static final ApexBand BAND = new ApexBand(0.05, 0.05);
    private static final double GN = 9.80665;
    private static final Arrest DROP = new Arrest(2, Math.sqrt(2 * GN * 0.02), Math.PI / 2, 0, 0.02);

    private static Requirement req(Job job, Limits limits, OptionalDouble pocket, SpringOptions opt, UnitSystem u) {
        Envelope env = new Envelope(OptionalDouble.empty(), OptionalDouble.empty(), Clearance.DEFAULT,
                OptionalDouble.empty(), pocket);
        return new Requirement("strict test", job, limits, env, opt, Ranking.defaults(), u, List.of());
    }

    private static Requirement req(Job job, Limits limits) {
        return req(job, limits, OptionalDouble.empty(), SpringOptions.defaults(), UnitSystem.SI);
    }

    private static Limits stroke(double m) {
        return new Limits(m, OptionalDouble.empty(), OptionalDouble.empty());
    }

    private static SpringOptions rules(double clashAllowance, boolean solidSafe, OptionalDouble cycles, double margin) {
        return new SpringOptions(List.of(), List.of(EndType.CLOSED_GROUND), 4, 12, 3, 20, clashAllowance, solidSafe,
                false, Seating.FLAT_FLAT, Optional.empty(), cycles, false, margin, 2);
    }

    private static SimulationSummary arrest(double compression, double force, double stress, boolean clash,
                                            double rebound) {
        return new SimulationSummary(20, compression, force, stress, clash, clash ? 0.004 : Double.NaN,
                clash ? 21 : 0, Double.NaN, 0.03, rebound, Double.NaN, Double.NaN, List.of(), List.of());
    }

    private static SimulationSummary launch(double compression, double force, double stress, double exit,
                                            double apex) {
        return new SimulationSummary(20, compression, force, stress, false, Double.NaN, 0, Double.NaN, Double.NaN,
                Double.NaN, exit, apex, List.of(), List.of());
    }

    /** The two figures a breach quotes, read back from its words: "… A unit exceeds … B unit by …". */
    private static double[] quoted(String words, String unit) {
        Matcher m = Pattern.compile("simulated [a-z ]+ ([0-9.]+) " + Pattern.quote(unit) + " exceeds [a-z._ ]+ ([0-9.]+) "
                + Pattern.quote(unit) + " by ").matcher(words);
        assertThat(m.find()).as(words).isTrue();
        return new double[] {Double.parseDouble(m.group(1)), Double.parseDouble(m.group(2))};
    }

    // An impact sends a stress wave along the coils: the struck end's force rises in steps of about v0·√(k·m_a)
    // (Wahl, Mechanical Springs, 2nd ed., surge chapter, from memory; docs/dynamics.md section 4), so the simulated
    // peak force is well above the quasi-static balance. Within limits that hold for the simulated figures, that
    // difference is a warning and no breach.
    @Test
    void aRealDropMoreThanFivePercentOffTheBalanceBreaksNoLimitThatItsSimulatedFiguresMeet() {
        Evaluation e = DesignEvaluator.evaluate(SPRING, req(DROP, stroke(1)));
        SimulationSummary s = Simulator.simulate(SPRING, req(DROP, stroke(1)), e, SimulationOptions.defaults())
                .summary();
        assertThat(s.peakForce()).isGreaterThan(1.05 * e.peakForce());
        assertThat(s.flags()).anyMatch(f -> f.startsWith("simulated peak force"));
        Limits roomy = new Limits(1.01 * s.maxCompression(), OptionalDouble.of(1.01 * s.peakForce()),
                OptionalDouble.of(1.01 * (s.peakForce() - DROP.pushForce()) / DROP.mass()));
        Requirement r = req(DROP, roomy);
        assertThat(SimulatedLimits.breaches(s, DesignEvaluator.evaluate(SPRING, r), r, BAND)).isEmpty();
    }

    // A force limit between the balance's peak force and the simulated one: the balance meets it, the simulation
    // does not; the breach quotes both figures (four significant digits) and the excess.
    @Test
    void aForceLimitBetweenTheBalanceAndTheSimulationIsBrokenAndBothFiguresAreQuoted() {
        SimulationSummary s = Simulator.simulate(SPRING, req(DROP, stroke(1)), SimulationOptions.defaults()).summary();
        double balance = DesignEvaluator.evaluate(SPRING, req(DROP, stroke(1))).peakForce();
        double limit = (balance + s.peakForce()) / 2;
        Requirement r = req(DROP, new Limits(1, OptionalDouble.of(limit), OptionalDouble.empty()));
        Evaluation e = DesignEvaluator.evaluate(SPRING, r);
        assertThat(e.margin("peak_force").orElseThrow().holds()).isTrue();
        LimitBreach b = SimulatedLimits.breaches(s, e, r, BAND).stream().filter(x -> x.limit().equals("peak_force"))
                .findFirst().orElseThrow();
        assertThat(b.simulated()).isEqualTo(s.peakForce());
        assertThat(b.allowed()).isEqualTo(limit);
        double[] q = quoted(b.words(), "N");
        assertThat(q[0]).isCloseTo(s.peakForce(), within(5e-4 * s.peakForce()));
        assertThat(q[1]).isCloseTo(limit, within(5e-4 * limit));
        assertThat(b.words()).contains("exceeds limits.peak_force").endsWith(String.format(java.util.Locale.ROOT,
                "by %.1f %%", 100 * (s.peakForce() - limit) / limit));
    }

    // The load's deceleration is (spring force − constant push)/mass (Newton's second law; the push of a drop is its
    // weight m·gn): its peak is the simulated peak force's, quoted in gn.
    @Test
    void theSimulatedDecelerationIsThePeakForceLessThePushOverTheMassInGn() {
        SimulationSummary s = Simulator.simulate(SPRING, req(DROP, stroke(1)), SimulationOptions.defaults()).summary();
        double decel = (s.peakForce() - 2 * GN) / 2;
        Requirement tight = req(DROP, new Limits(1, OptionalDouble.empty(), OptionalDouble.of(0.99 * decel)));
        List<LimitBreach> b = SimulatedLimits.breaches(s, DesignEvaluator.evaluate(SPRING, tight), tight, BAND);
        assertThat(b).singleElement().satisfies(x -> {
            assertThat(x.limit()).isEqualTo("deceleration");
            assertThat(x.simulated()).isCloseTo(decel, within(1e-9 * decel));
            assertThat(quoted(x.words(), "gn")[0]).isCloseTo(decel / GN, within(5e-4 * decel / GN));
        });
        Requirement roomy = req(DROP, new Limits(1, OptionalDouble.empty(), OptionalDouble.of(1.01 * decel)));
        assertThat(SimulatedLimits.breaches(s, DesignEvaluator.evaluate(SPRING, roomy), roomy, BAND)).isEmpty();
    }

    // With a pocket the stroke counts from first contact, as the evaluator counts it: 10 mm of preload (pocket
    // 70 mm, L0 80 mm) and 14 mm of travel meet a 15 mm stroke; 16 mm of travel does not.
    @Test
    void theStrokeCountsFromFirstContactInAPocket() {
        Requirement r = req(DROP, stroke(0.015), OptionalDouble.of(0.070), SpringOptions.defaults(), UnitSystem.SI);
        Evaluation e = DesignEvaluator.evaluate(SPRING, r);
        assertThat(e.preloadDeflection()).isCloseTo(0.010, within(1e-12));
        assertThat(SimulatedLimits.breaches(arrest(0.014, 100, 1e8, false, 0.5), e, r, BAND)).isEmpty();
        assertThat(SimulatedLimits.breaches(arrest(0.016, 100, 1e8, false, 0.5), e, r, BAND))
                .extracting(LimitBreach::limit).containsExactly("stroke");
    }

    @Test
    void aSimulatedStressOverTheAllowableAndAnUnfinishedEventAreBreaches() {
        Requirement r = req(DROP, stroke(1));
        Evaluation e = DesignEvaluator.evaluate(SPRING, r);
        List<LimitBreach> b = SimulatedLimits.breaches(arrest(0.015, 200, 1.1 * e.allowableStress(), false,
                Double.NaN), e, r, BAND);
        assertThat(b).extracting(LimitBreach::limit).containsExactly("event", "stress_working");
        assertThat(b.get(1).allowed()).isEqualTo(e.allowableStress());
        assertThat(quoted(b.get(1).words(), "MPa")[1]).isCloseTo(e.allowableStress() * 1e-6,
                within(5e-4 * e.allowableStress() * 1e-6));
    }

    // The clash allowance ξ asks for L0 − Ls ≥ (1 + ξ)·(largest deflection): 44 mm/1.15 = 38.26 mm. A clash breaks
    // it unless the requirement lets the spring reach solid (ξ = 0 with a wire that is safe at solid).
    @Test
    void coilsMayClashOnlyWhenTheRequirementLetsTheSpringReachSolid() {
        SimulationSummary clash = arrest(0.030, 500, 1e8, true, 0.5);
        for (var c : List.of(new Object[] {0.15, true, 1}, new Object[] {0.0, false, 1}, new Object[] {0.0, true, 0})) {
            Requirement r = req(DROP, stroke(1), OptionalDouble.empty(), rules((double) c[0], (boolean) c[1],
                    OptionalDouble.empty(), 1), UnitSystem.SI);
            assertThat(SimulatedLimits.breaches(clash, DesignEvaluator.evaluate(SPRING, r), r, BAND))
                    .as("clash allowance %s, solid safe %s", c[0], c[1]).hasSize((int) c[2])
                    .allMatch(b -> b.limit().equals("coil_bind") && b.words().contains("element 21 of 21"));
        }
        Requirement r = req(DROP, stroke(1));
        Evaluation e = DesignEvaluator.evaluate(SPRING, r);
        assertThat(SimulatedLimits.breaches(arrest(0.0380, 500, 1e8, false, 0.5), e, r, BAND)).isEmpty();
        assertThat(SimulatedLimits.breaches(arrest(0.0385, 500, 1e8, false, 0.5), e, r, BAND)).singleElement()
                .satisfies(b -> assertThat(b.allowed()).isCloseTo(0.044 / 1.15, within(1e-9)));
    }

    // With spring.cycles the fatigue margin holds at the simulated peak stress: at the balance's own stress the rule
    // gives the evaluator's safety factor; 10 % more stress lowers it below a margin the balance just meets.
    @Test
    void theFatigueMarginHoldsAtTheSimulatedPeakStress() {
        Requirement probe = req(DROP, stroke(1), OptionalDouble.empty(), rules(0.15, true, OptionalDouble.of(1e6), 0.5),
                UnitSystem.SI);
        double n0 = DesignEvaluator.evaluate(SPRING, probe).fatigue().orElseThrow().safetyFactor();
        assertThat(n0).isBetween(0.6, 5.0);
        Requirement r = req(DROP, stroke(1), OptionalDouble.empty(), rules(0.15, true, OptionalDouble.of(1e6),
                0.99 * n0), UnitSystem.SI);
        Evaluation e = DesignEvaluator.evaluate(SPRING, r);
        assertThat(SimulatedLimits.breaches(arrest(0.015, 200, e.stressAtWorking(), false, 0.5), e, r, BAND))
                .isEmpty();
        assertThat(SimulatedLimits.breaches(arrest(0.015, 200, 1.1 * e.stressAtWorking(), false, 0.5), e, r, BAND))
                .singleElement().satisfies(b -> {
                    assertThat(b.limit()).isEqualTo("fatigue");
                    assertThat(b.simulated()).isLessThan(0.99 * n0);
                });
    }

    // The launch band of the Monte Carlo, ±5 % of the target rise by default.
    @Test
    void aLaunchMustLeaveTheGuideAndReachTheLaunchBand() {
        Launch up = new Launch(0.1, 0.5, Math.PI / 2, 0);
        Requirement r = req(up, stroke(1));
        Evaluation e = DesignEvaluator.evaluate(SPRING, r);
        double x = e.workingDeflection();
        double f = e.peakForce();
        double tau = e.stressAtWorking();
        assertThat(SimulatedLimits.breaches(launch(x, f, tau, 3, 0.96 * 0.5), e, r, BAND)).isEmpty();
        assertThat(SimulatedLimits.breaches(launch(x, f, tau, 3, 1.04 * 0.5), e, r, BAND)).isEmpty();
        assertThat(SimulatedLimits.breaches(launch(x, f, tau, 3, 0.94 * 0.5), e, r, BAND)).singleElement()
                .satisfies(b -> {
                    assertThat(b.limit()).isEqualTo("launch_height");
                    assertThat(b.allowed()).isCloseTo(0.475, within(1e-12));
                    assertThat(b.words()).contains("falls short of launch.height 500 mm by 6.0 %")
                            .contains("475 to 525 mm");
                });
        assertThat(SimulatedLimits.breaches(launch(x, f, tau, 3, 1.06 * 0.5), e, r, BAND)).singleElement()
                .satisfies(b -> assertThat(b.allowed()).isCloseTo(0.525, within(1e-12)));
        assertThat(SimulatedLimits.breaches(launch(x, f, tau, 3, 1.5 * 0.5), e, r,
                new ApexBand(0.05, Double.POSITIVE_INFINITY))).isEmpty();
        assertThat(SimulatedLimits.breaches(launch(x, f, tau, 0, -0.0005), e, r, BAND)).singleElement()
                .satisfies(b -> assertThat(b.words()).isEqualTo("the payload does not leave the guide in the"
                        + " simulation: it comes to rest 0.5 mm below the muzzle"));
    }

    @Test
    void differencesFromTheBalanceAndALightLoadStayWarnings() {
        Arrest light = new Arrest(SPRING.activeMass() / 2, 1, Math.PI / 2, 0, Double.NaN);
        Requirement r = req(light, stroke(1));
        Evaluation e = DesignEvaluator.evaluate(SPRING, r);
        SimulationSummary s = arrest(e.workingDeflection(), 1.07 * e.peakForce(), e.stressAtWorking(), false, 0.5);
        assertThat(DynamicsFlags.warnings(s, e, light)).hasSize(2);
        assertThat(SimulatedLimits.breaches(s, e, r, BAND)).isEmpty();
    }

    // US customary words: 1 lbf = 4.4482216152605 N, 1 in = 0.0254 m (NIST SP 811, 2008 ed., Appendix B; from
    // memory).
    @Test
    void aUsCustomaryRequirementGetsItsBreachesInPoundsForceAndInches() {
        double lbf = 4.4482216152605;
        Requirement r = req(DROP, new Limits(0.5 * 0.0254, OptionalDouble.of(100 * lbf), OptionalDouble.empty()),
                OptionalDouble.empty(), SpringOptions.defaults(), UnitSystem.US);
        Evaluation e = DesignEvaluator.evaluate(SPRING, r);
        List<LimitBreach> b = SimulatedLimits.breaches(arrest(0.6 * 0.0254, 110 * lbf, 1e8, false, 0.5), e, r, BAND);
        assertThat(b).extracting(LimitBreach::limit).containsExactly("stroke", "peak_force");
        assertThat(quoted(b.get(0).words(), "in")).containsExactly(0.6, 0.5);
        assertThat(quoted(b.get(1).words(), "lbf")).containsExactly(110, 100);
        assertThat(b.get(1).words()).endsWith("by 10.0 %");
        assertThat(b.get(0).words() + b.get(1).words()).doesNotContain(" mm", " N ");
    }
}
