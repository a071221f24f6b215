package org.finstack.cli;

/** Entry point. */
public final class Main {
    private Main() {
    }

    /** @param args command-line arguments */
    public static void main(String[] args) {
        System.out.println("finstack");
    }
}
