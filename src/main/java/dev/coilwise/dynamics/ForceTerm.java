package dev.coilwise.dynamics;

import java.util.List;
import org.apache.commons.math3.ode.events.EventHandler;

/**
 * One contribution to the forces on the chain and the load. Each term adds its forces, N, to {@code f}
 * (f[0..N−1] on the coils, positive towards the base; f[N] on the load) and declares the switching functions of
 * its own discontinuities, so the integrator never steps across one.
 */
interface ForceTerm {
    /** Adds this term's forces for state {@code y} (layout as in {@link TopFace}). */
    void addForces(double[] y, double[] f);

    /**
     * Whether the term's forces never change (they do not depend on the state, the time or any switch): such a term
     * is asked for its forces once, with a null state.
     */
    default boolean constant() {
        return false;
    }

    /** Sets the term's own switches from the initial state. */
    default void start(double[] y) {
    }

    /** Event handlers that locate this term's discontinuities. */
    default List<EventHandler> detectors() {
        return List.of();
    }
}
