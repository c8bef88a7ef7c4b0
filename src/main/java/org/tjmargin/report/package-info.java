/**
 * Writers of results: the terminal summary table, {@code results.json}, {@code sweep.csv}, the HTML review report
 * and its charts, and the safety cautions every output carries. Writers read the result records of
 * {@code org.tjmargin.solve} and never recompute physics. Files are written whole or not at all
 * ({@link org.tjmargin.report.OutputFiles}).
 *
 * <p>Depends on the domain, Jackson (JSON), Commons CSV, JFreeChart/JFreeSVG and a template engine; never on
 * {@code design} (input files) or {@code cli}.
 */
package org.tjmargin.report;
