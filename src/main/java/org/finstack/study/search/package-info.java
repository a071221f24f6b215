/**
 * Candidate search: replacement coils generated from the trade's generic tube patterns
 * ({@code coil-library/patterns.json}) within a project's constraints, rated in parallel at the
 * project's conditions, ranked by a stated order and marked on the Pareto front of capacity
 * against air pressure drop. Pure functions of immutable records apart from the worker pool a
 * search owns for its own duration; no Swing, no units parsing beyond the pattern file.
 */
package org.finstack.study.search;
