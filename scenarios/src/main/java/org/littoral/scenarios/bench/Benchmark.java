package org.littoral.scenarios.bench;

import java.io.PrintStream;

/** A named benchmark for {@code littoral bench NAME}: prints its figures (median, spread, throughput, memory). */
public interface Benchmark {
    String name();

    String description();

    /** Runs the benchmark and prints its figures; returns 0 when the target is met, 1 otherwise. */
    int run(PrintStream out, boolean quick) throws Exception;
}
