/**
 * Reading requirement files and spring files: YAML in, validated model records in SI out.
 *
 * <p>This is the only package that deals with units: every quantity in a file is a string with its unit ("45 mm",
 * "12 kN", "140 lbf/in"), parsed by {@link dev.coilwise.requirement.Quantities} with Indriya (JSR 385) plus the
 * customary units of the trade, checked for its dimension and converted to SI at once. The file's unit system
 * (SI or US customary) is decided by the majority of its dimensional quantities.
 *
 * <p>Reading never stops at the first mistake. The YAML is read to a plain tree that keeps the line and column of
 * every key and value; section readers walk it and report each problem (unknown key with the nearest valid one,
 * missing key, wrong type, wrong dimension, value out of range, keys that contradict each other) as an
 * {@link dev.coilwise.requirement.InputProblem}. All problems of a file are thrown together in one
 * {@link dev.coilwise.requirement.RequirementException}, a {@link dev.coilwise.error.BadInputException} (exit 2).
 *
 * <p>Reading is safe against hostile files: size limit of 1 MiB, no type tags (nothing is instantiated from a
 * file), no aliases, a nesting limit. The format is described in {@code docs/requirement-format.md}.
 */
package dev.coilwise.requirement;
