package dev.coilwise.mechanics;

import static org.assertj.core.api.Assertions.assertThat;

import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.Clearance;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Envelope;
import dev.coilwise.model.Job;
import dev.coilwise.model.Launch;
import dev.coilwise.model.Limits;
import dev.coilwise.model.Ranking;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import dev.coilwise.model.SpringOptions;
import dev.coilwise.model.UnitSystem;
import dev.coilwise.testing.Printed;
import java.util.List;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

/**
 * The design evaluation on hand-worked cases. The spring is the one of Shigley's MED 9th ed., Example 10-2
 * (oil-tempered, d = 4 mm, D = 40 mm, Na = 11.6, plain ends, L0 = 80 mm). Every expected figure below was worked
 * by hand (calculator) from the equations of docs/method.md, with the table's G = 77.2 GPa, ρ = 7850 kg/m³,
 * Sut = 1855/4^0.187 = 1431.39 MPa: k = 3327.59 N/m, Ls = 50.4 mm, allowable 0.50·Sut = 715.696 MPa,
 * K_B = 42/37, C = 10. Defaults: index 4..12, 3..20 coils, ξ = 0.15, solid-safe, flat-flat seats.
 */
class DesignEvaluatorTest {
    private static final Spring SPRING = new Spring(MaterialTable.loadDefault().get("oil-tempered"), EndType.PLAIN,
            4e-3, 40e-3, 11.6, 80e-3);

    private static Requirement requirement(Job job, Limits limits, Envelope envelope) {
        return new Requirement("hand-worked case", job, limits, envelope, SpringOptions.defaults(), Ranking.defaults(),
                UnitSystem.SI, List.of());
    }

    private static Limits limits(double stroke, double peak) {
        return new Limits(stroke, OptionalDouble.of(peak), OptionalDouble.empty());
    }

    private static double margin(Evaluation e, String key) {
        return e.margin(key).orElseThrow(() -> new AssertionError("no margin " + key)).value();
    }

    /** 1 kg moving horizontally at 1 m/s, stroke limit 20 mm. */
    private static final Arrest ONE_KG_AT_ONE_M_S = new Arrest(1, 1, 0, 0, Double.NaN);

    @Test
    void arrestWithinEveryLimit() {
        // x = v·√(m/k) = 17.3355 mm; F = k·x = 57.6852 N; deceleration F/m = 57.6852 m/s².
        // Margins (allowed − actual)/allowed: stroke (20 − 17.3355)/20 = 0.13323; peak force (60 − 57.6852)/60 =
        // 0.038579; coil bind: allowed (80 − 50.4)/1.15 = 25.7391 mm → 0.32649; working stress
        // τ = K_B·8FD/(πd³) = 104.216 MPa → 0.85439; stress at solid (F = 98.4966 N) 177.946 MPa → 0.75137;
        // index min((10 − 4)/4, (12 − 10)/12) = 0.16667; coils min((11.6 − 3)/3, (20 − 11.6)/20) = 0.42000;
        // buckling: L0 = 80 mm < 2.63·40/0.5 = 210.4 mm, stable; surge: v_lim = 715.696 MPa/√(2·7850·77.2e9) =
        // 20.5575 m/s → (20.5575 − 1)/20.5575 = 0.95136. Binding: peak force.
        Evaluation e = DesignEvaluator.evaluate(SPRING, requirement(ONE_KG_AT_ONE_M_S, limits(20e-3, 60),
                Envelope.open()));
        Printed.matches("x, mm", e.workingDeflection() * 1e3, "17.3355");
        Printed.matches("peak force, N", e.peakForce(), "57.6852");
        Printed.matches("deceleration", e.peakDeceleration(), "57.6852");
        Printed.matches("stroke", margin(e, "stroke"), "0.13323");
        Printed.matches("peak_force", margin(e, "peak_force"), "0.038579");
        Printed.matches("coil_bind", margin(e, "coil_bind"), "0.32649");
        Printed.matches("stress_working", margin(e, "stress_working"), "0.85439");
        Printed.matches("stress_solid", margin(e, "stress_solid"), "0.75137");
        Printed.matches("index", margin(e, "index"), "0.16667");
        Printed.matches("active_coils", margin(e, "active_coils"), "0.42000");
        assertThat(margin(e, "buckling")).isInfinite().isPositive();
        Printed.matches("surge", margin(e, "surge"), "0.95136");
        Printed.matches("surge speed limit", e.surgeSpeedLimit(), "20.5575");
        assertThat(e.predictedHeight()).isNaN();
        assertThat(e.feasible()).isTrue();
        assertThat(e.violations()).isEmpty();
        assertThat(e.binding()).get().extracting(Margin::key).isEqualTo("peak_force");
        assertThat(e.margins()).extracting(Margin::key).containsExactly("stroke", "peak_force", "coil_bind",
                "stress_working", "stress_solid", "index", "active_coils", "buckling", "surge");
    }

    @Test
    void aLowerForceLimitMakesTheDesignInfeasible() {
        // Peak limit 55 N: (55 − 57.6852)/55 = −0.048822, the only violation.
        Evaluation e = DesignEvaluator.evaluate(SPRING, requirement(ONE_KG_AT_ONE_M_S, limits(20e-3, 55),
                Envelope.open()));
        assertThat(e.feasible()).isFalse();
        assertThat(e.violations()).extracting(Margin::key).containsExactly("peak_force");
        Printed.matches("peak_force", margin(e, "peak_force"), "-0.048822");
        assertThat(e.binding()).get().extracting(Margin::key).isEqualTo("peak_force");
    }

    @Test
    void preloadFromAPocketRaisesThePeakForce() {
        // Pocket 75 mm: preload deflection 5 mm, F0 = 16.6379 N. ½kx² + F0·x = ½mv² gives x = 13.0421 mm; total
        // 18.0421 mm; peak F0 + kx = 60.0367 N, over the 60 N limit: (60 − 60.0367)/60 = −0.00061189.
        // Coil bind (25.7391 − 18.0421)/25.7391 = 0.29904; pocket (80 − 75)/75 = 0.066667.
        Envelope pocket = new Envelope(OptionalDouble.empty(), OptionalDouble.empty(), Clearance.DEFAULT,
                OptionalDouble.empty(), OptionalDouble.of(75e-3));
        Evaluation e = DesignEvaluator.evaluate(SPRING, requirement(ONE_KG_AT_ONE_M_S, limits(20e-3, 60), pocket));
        Printed.matches("F0, N", e.preloadForce(), "16.6379");
        Printed.matches("x, mm", e.workingDeflection() * 1e3, "13.0421");
        Printed.matches("total, mm", e.totalDeflection() * 1e3, "18.0421");
        Printed.matches("peak, N", e.peakForce(), "60.0367");
        Printed.matches("peak_force", margin(e, "peak_force"), "-0.00061189");
        Printed.matches("coil_bind", margin(e, "coil_bind"), "0.29904");
        Printed.matches("pocket", margin(e, "pocket"), "0.066667");
        assertThat(e.feasible()).isFalse();
        assertThat(e.binding()).get().extracting(Margin::key).isEqualTo("peak_force");
    }

    @Test
    void coilsGrowingAtSolidNoLongerFitTheBore() {
        // Bore 46 mm with the default 5 % clearance: OD must stay within 43.7 mm. Free OD is 44 mm already; at
        // solid it is 44.0341 mm (SolidGrowthTest): (43.7 − 44.0341)/43.7 = −0.0076450. Guided, buckling is
        // reported but no longer a hard limit.
        Envelope bore = new Envelope(OptionalDouble.of(46e-3), OptionalDouble.empty(), Clearance.DEFAULT,
                OptionalDouble.empty(), OptionalDouble.empty());
        Evaluation e = DesignEvaluator.evaluate(SPRING, requirement(ONE_KG_AT_ONE_M_S, limits(20e-3, 60), bore));
        Printed.matches("fit_bore", margin(e, "fit_bore"), "-0.0076450");
        assertThat(e.margin("buckling")).get().extracting(Margin::hard).isEqualTo(false);
        assertThat(e.feasible()).isFalse();
        assertThat(e.violations()).extracting(Margin::key).containsExactly("fit_bore");
    }

    @Test
    void launchToOneMetre() {
        // 50 g thrown straight up 1 m, no losses. m_a = 11.6·π·40 mm·π(4 mm)²/4·7850 = 0.143796 kg.
        // ½k·xc² = (m + m_a/2)·g·xc + ½(m + m_a/3)·2gH gives xc = 24.3875 mm; cocking force k·xc = 81.1514 N;
        // exit speed √(2gH) = 4.42869 m/s. Margins: stroke 30 mm → 0.18708; coil bind (25.7391 − 24.3875)/25.7391 =
        // 0.052514, the binding one; working stress 146.610 MPa → 0.79515; surge (20.5575 − 4.42869)/20.5575 =
        // 0.78457.
        Evaluation e = DesignEvaluator.evaluate(SPRING, requirement(new Launch(0.05, 1.0, Math.PI / 2, 0),
                new Limits(30e-3, OptionalDouble.empty(), OptionalDouble.empty()), Envelope.open()));
        Printed.matches("xc, mm", e.workingDeflection() * 1e3, "24.3875");
        Printed.matches("cocking force, N", e.peakForce(), "81.1514");
        Printed.matches("exit speed", e.speed(), "4.42869");
        Printed.matches("height", e.predictedHeight(), "1.00000");
        assertThat(e.peakDeceleration()).isNaN();
        Printed.matches("stroke", margin(e, "stroke"), "0.18708");
        Printed.matches("coil_bind", margin(e, "coil_bind"), "0.052514");
        Printed.matches("stress_working", margin(e, "stress_working"), "0.79515");
        Printed.matches("surge", margin(e, "surge"), "0.78457");
        assertThat(e.feasible()).isTrue();
        assertThat(e.binding()).get().extracting(Margin::key).isEqualTo("coil_bind");
    }
}
