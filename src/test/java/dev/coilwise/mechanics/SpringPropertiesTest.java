package dev.coilwise.mechanics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.materials.Material;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Seating;
import dev.coilwise.model.Spring;
import dev.coilwise.testing.Generators;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/** Properties of the geometry, rate and stress over wide random valid springs. */
class SpringPropertiesTest {

    @Provide
    Arbitrary<Spring> springs() {
        return Generators.springs();
    }

    @Provide
    Arbitrary<Double> wider() {
        return Generators.uniform(1.05, 4);
    }

    @Provide
    Arbitrary<Double> forces() {
        return Generators.uniform(0, 1e6);
    }

    @Provide
    Arbitrary<Double> forceSteps() {
        return Generators.logUniform(1e-9, 1e6);
    }

    @Property(tries = 500)
    void rateIsGd4Over8D3Na(@ForAll("springs") Spring s) {
        double d = s.wireDiameter();
        double dm = s.meanDiameter();
        double expected = s.shearModulus() * Math.pow(d, 4) / (8 * Math.pow(dm, 3) * s.activeCoils());
        assertThat(s.rate()).isCloseTo(expected, within(1e-12 * expected));
    }

    @Property(tries = 500)
    void rateScalesAsMeanDiameterCubedAndCoilsInverse(@ForAll("springs") Spring s,
                                                     @ForAll("wider") double factor) {
        Spring wider = new Spring(s.material(), s.ends(), s.wireDiameter(), s.meanDiameter() * factor,
                s.activeCoils(), s.freeLength());
        assertThat(wider.rate() * Math.pow(factor, 3)).isCloseTo(s.rate(), within(1e-12 * s.rate()));
        double more = s.activeCoils() * factor;
        double l0 = Math.max(s.freeLength(), 2 * s.ends().solidLength(s.wireDiameter(), s.ends().totalCoils(more)));
        Spring longer = new Spring(s.material(), s.ends(), s.wireDiameter(), s.meanDiameter(), more, l0);
        assertThat(longer.rate() * factor).isCloseTo(s.rate(), within(1e-12 * s.rate()));
    }

    /** Two wire diameters of a material whose moduli do not change with diameter. */
    @Provide
    Arbitrary<double[]> wirePairs() {
        return Arbitraries.of(Generators.TABLE.all().stream().filter(m -> m.moduli().size() == 1).toList())
                .flatMap(m -> Combinators.combine(Generators.logUniform(m.minDiameter(), m.maxDiameter()),
                        Generators.logUniform(m.minDiameter(), m.maxDiameter()), Generators.logUniform(0.5, 100))
                        .as((d1, d2, na) -> new double[] {Generators.TABLE.all().indexOf(m), d1, d2, na}));
    }

    @Property(tries = 500)
    void rateScalesAsWireDiameterToTheFourth(@ForAll("wirePairs") double[] pair) {
        Material m = Generators.TABLE.all().get((int) pair[0]);
        double d1 = pair[1];
        double d2 = pair[2];
        double na = pair[3];
        double dm = 12 * Math.max(d1, d2);
        double l0 = 3 * EndType.CLOSED.solidLength(Math.max(d1, d2), EndType.CLOSED.totalCoils(na));
        Spring s1 = new Spring(m, EndType.CLOSED, d1, dm, na, l0);
        Spring s2 = new Spring(m, EndType.CLOSED, d2, dm, na, l0);
        assertThat(s2.rate()).isCloseTo(s1.rate() * Math.pow(d2 / d1, 4), within(1e-12 * s2.rate()));
    }

    @Property(tries = 500)
    void correctedStressIsIncreasingAndLinearInForce(@ForAll("springs") Spring s,
                                                    @ForAll("forces") double f1,
                                                    @ForAll("forceSteps") double df) {
        double d = s.wireDiameter();
        double dm = s.meanDiameter();
        double t1 = Stress.corrected(f1, dm, d);
        double t2 = Stress.corrected(f1 + df, dm, d);
        assertThat(t2).isGreaterThan(t1);
        assertThat(Stress.corrected(2 * f1, dm, d)).isCloseTo(2 * t1, within(1e-12 * Math.max(t1, 1)));
        assertThat(Stress.forceFor(t2, dm, d)).isCloseTo(f1 + df, within(1e-9 * (f1 + df)));
    }

    @Property(tries = 1000)
    void derivedFiguresAreFiniteAndPositive(@ForAll("springs") Spring s) {
        double[] positive = {s.rate(), s.solidLength(), s.deflectionToSolid(), s.pitch(), s.mass(), s.activeMass(),
            s.wireLength(), s.outerDiameter(), s.innerDiameter(), s.index(), s.totalCoils(), s.tensileStrength(),
            s.shearModulus(), s.youngsModulus(), SolidGrowth.outerDiameterAtSolid(s), Surge.frequencyFixedFixed(s),
            Surge.frequencyFixedFree(s), Stress.corrected(s.forceAt(s.deflectionToSolid()), s.meanDiameter(),
                s.wireDiameter())};
        for (double v : positive) {
            assertThat(v).isFinite().isPositive();
        }
        assertThat(s.pitch()).isGreaterThanOrEqualTo(s.wireDiameter() * (1 - 1e-12));
        assertThat(SolidGrowth.outerDiameterAtSolid(s)).isGreaterThanOrEqualTo(s.outerDiameter());
        assertThat(s.totalCoils()).isGreaterThanOrEqualTo(s.activeCoils());
        for (Seating seat : Seating.values()) {
            assertThat(Buckling.criticalDeflection(s, seat)).isPositive().isNotNaN();
        }
        if (s.ends() == EndType.PLAIN) {
            assertThat(s.totalCoils()).isEqualTo(s.activeCoils());
        }
    }
}
