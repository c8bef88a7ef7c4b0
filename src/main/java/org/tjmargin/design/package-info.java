/**
 * The input files: the parts library and the design file (YAML or JSON, chosen by the file's extension), read with
 * Jackson's streaming parser into a small tree that keeps every value's line and column, validated once, and mapped
 * into the domain records ({@link org.tjmargin.device.BreakdownPart}, {@link org.tjmargin.solve.Board} and what
 * they hold).
 *
 * <p>Entry point: {@link org.tjmargin.design.DesignLoader#load(java.nio.file.Path)}. Every problem found in a file
 * is collected, located by file, line, column and field path, and all of them are thrown together as one
 * {@link org.tjmargin.design.InputException}. The format is described in {@code src/site/markdown/file-format.md}.
 *
 * <p>This is the only package, besides {@code cli}, that reads input files. It depends on the domain packages and
 * on {@code units} for every quantity read from text; the domain packages never depend on it.
 */
package org.tjmargin.design;
