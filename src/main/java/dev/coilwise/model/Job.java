package dev.coilwise.model;

/** What the spring must do: arrest a moving load or launch a payload. */
public sealed interface Job permits Arrest, Launch {
    /** Mass of the load or payload, kg. */
    double mass();

    /** The requirement-file key of the job: {@code arrest} or {@code launch}. */
    String key();
}
