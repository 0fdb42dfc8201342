package dev.coilwise.scatter;

import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.mechanics.LaunchBalance;
import dev.coilwise.mechanics.Margin;
import dev.coilwise.mechanics.Stress;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.Launch;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import java.util.List;
import java.util.Set;

/**
 * How a made spring sits in the machine built for the nominal design, and what it then does. The machine does not
 * change with the spring: an arrest pocket keeps its length; a launcher keeps its cocked length.
 */
abstract class Installation {
    /** Margins that are rules for the design as drawn, not limits on the made part: spring index and coil count range. */
    static final Set<String> DESIGN_RULES = Set.of("index", "active_coils");

    final Requirement requirement;

    Installation(Requirement requirement) {
        this.requirement = requirement;
    }

    /** The figures {@link #run} writes, in order. */
    abstract List<Figure> figures();

    /**
     * Works the made spring once, writes its figures (SI, in {@link #figures()} order) into {@code out} and says
     * whether it meets the requirement.
     *
     * @param made                the made spring
     * @param freeLengthDeviation its free length minus the nominal free length, m
     */
    abstract boolean run(Spring made, double freeLengthDeviation, double[] out);

    static Installation of(Spring nominal, Requirement req, ScatterSettings settings) {
        if (req.job() instanceof Launch launch) {
            Evaluation e = DesignEvaluator.evaluate(nominal, req);
            return new Launcher(req, launch, e.workingDeflection(), settings);
        }
        return new Buffer(req);
    }

    /** Whether every hard limit on the made part holds (design rules aside). */
    static boolean limitsHold(Evaluation e) {
        for (Margin m : e.margins()) {
            if (m.hard() && !m.holds() && !DESIGN_RULES.contains(m.key())) {
                return false;
            }
        }
        return true;
    }

    /** Arrest: the energy balance is re-run on the made spring; a pocket, if any, keeps its length. */
    static final class Buffer extends Installation {
        static final List<Figure> FIGURES = List.of(Figure.MAX_COMPRESSION, Figure.PEAK_FORCE,
                Figure.PEAK_DECELERATION, Figure.STRESS_AT_PEAK, Figure.RATE, Figure.SOLID_LENGTH);

        Buffer(Requirement requirement) {
            super(requirement);
        }

        @Override
        List<Figure> figures() {
            return FIGURES;
        }

        @Override
        boolean run(Spring made, double freeLengthDeviation, double[] out) {
            Evaluation e = DesignEvaluator.evaluate(made, requirement);
            out[0] = e.workingDeflection();
            out[1] = e.peakForce();
            out[2] = e.peakDeceleration();
            out[3] = e.stressAtWorking();
            out[4] = e.rate();
            out[5] = made.solidLength();
            return limitsHold(e);
        }
    }

    /**
     * Launch: the mechanism holds the cocked length L0 − x_c of the nominal design, so a made spring is compressed by
     * x_c + ΔL0 and throws to whatever height that gives. The apex is reported above the nominal muzzle (the made
     * spring releases ΔL0·sin θ higher). It meets the requirement when that apex lies within the settings' band
     * around the target and every hard limit holds at the actual cocked compression.
     */
    static final class Launcher extends Installation {
        static final List<Figure> FIGURES = List.of(Figure.COCKED_COMPRESSION, Figure.PREDICTED_HEIGHT,
                Figure.COCKING_FORCE, Figure.STRESS_AT_COCKED, Figure.RATE, Figure.SOLID_LENGTH);

        private final Launch launch;
        private final double cocked;
        private final double lowest;
        private final double highest;

        Launcher(Requirement requirement, Launch launch, double cocked, ScatterSettings settings) {
            super(requirement);
            this.launch = launch;
            this.cocked = cocked;
            this.lowest = launch.height() * (1 - settings.heightShortfall());
            this.highest = launch.height() * (1 + settings.heightOvershoot());
        }

        @Override
        List<Figure> figures() {
            return FIGURES;
        }

        @Override
        boolean run(Spring made, double freeLengthDeviation, double[] out) {
            double k = made.rate();
            double x = cocked + freeLengthDeviation;
            double rise = LaunchBalance.height(k, x, launch.mass(), made.activeMass(), launch.angle(),
                    launch.efficiency());
            double force = k * x;
            double apex = rise + freeLengthDeviation * Math.sin(launch.angle());
            out[0] = x;
            out[1] = apex;
            out[2] = force;
            out[3] = Stress.corrected(force, made.meanDiameter(), made.wireDiameter());
            out[4] = k;
            out[5] = made.solidLength();
            if (rise <= 0 || apex < lowest || apex > highest) {
                return false;
            }
            // Every limit at compression x: the evaluator solves the cocked compression for a target rise, so ask it
            // for the rise this spring gives from x, which returns x itself.
            Launch actual = new Launch(launch.mass(), rise, launch.angle(), launch.losses());
            Requirement req = new Requirement(requirement.title(), actual, requirement.limits(),
                    requirement.envelope(), requirement.spring(), requirement.ranking(), requirement.units(),
                    requirement.stock());
            return limitsHold(DesignEvaluator.evaluate(made, req));
        }
    }
}
