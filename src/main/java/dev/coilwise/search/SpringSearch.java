package dev.coilwise.search;

/** A search over the declared design space: returns the best feasible design of every family. */
public interface SpringSearch {
    SearchResult run(DesignSpace space);
}
