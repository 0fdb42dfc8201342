package dev.coilwise.model;

/** Whether stock parts or custom designs come first in the shortlist when both are feasible. */
public enum Prefer {
    STOCK, CUSTOM, NONE
}
