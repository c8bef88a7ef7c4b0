package org.tjmargin.cli;

/** Entry point placeholder while the command line is built. */
public final class Main {
    private Main() {
    }

    public static void main(String[] args) {
        System.out.println("tjmargin");
    }
}
