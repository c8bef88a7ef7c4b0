package org.tjmargin.design;

/**
 * The file being mapped and where its problems go: every report of a reader passes through here, which adds the
 * file's name and the node's line and column.
 *
 * @param name     the file's name for messages
 * @param problems the load's problems
 */
record FileContext(String name, Problems problems) {

    /** Reports a problem at a node. */
    void report(InputProblem.Kind kind, Node at, String field, String message) {
        problems.add(new InputProblem(kind, name, at.line(), at.column(), field, message));
    }

    /** Reports a problem at a line and column. */
    void report(InputProblem.Kind kind, int line, int column, String field, String message) {
        problems.add(new InputProblem(kind, name, line, column, field, message));
    }
}
