/**
 * Stored baselines and regression checks: {@code twinorbit baseline} keeps the complete case
 * definitions and every measured number of a run, a suite or a scan in a schema-versioned JSON
 * file; {@code twinorbit check} reruns exactly those cases and compares each number with a
 * tolerance, reporting regressions, improvements, new and missing rows as Markdown, JUnit XML
 * and JSON.
 */
package org.twinorbit.harness.baseline;
