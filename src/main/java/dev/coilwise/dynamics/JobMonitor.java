package dev.coilwise.dynamics;

import org.apache.commons.math3.ode.events.EventHandler.Action;

/**
 * The job's reading of the events: records what happened and says when the event is over ({@link Action#STOP}).
 * Each method is called after the detector has updated the model's switches.
 */
interface JobMonitor {
    /** The load touched the face ({@code pressed}) or left it. */
    default Action onContact(double t, double[] y, boolean pressed) {
        return Action.CONTINUE;
    }

    /** The load's speed passed zero, rising (from moving away from the base to moving towards it) or falling. */
    default Action onLoadSpeedZero(double t, double[] y, boolean rising) {
        return Action.CONTINUE;
    }

    /**
     * The load passed the job's reference level, outwards (away from the base) or back in: the muzzle of a launch
     * (the free-length top) or the point of first contact of an arrest.
     */
    default Action onPassing(double t, double[] y, boolean outward) {
        return Action.CONTINUE;
    }
}
