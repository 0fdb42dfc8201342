package dev.coilwise.model;

/** Which preferred wire-diameter series the search draws from. */
public enum WireSeries {
    METRIC, INCH
}
