package org.littoral.scenarios.cli;

import org.littoral.scenarios.bench.AnalysisBenchmark;
import org.littoral.scenarios.bench.Benchmark;
import org.littoral.scenarios.bench.InputFuzzBenchmark;
import org.littoral.scenarios.bench.LinearBenchmark;
import org.littoral.scenarios.bench.MemoryEstimateBenchmark;
import org.littoral.scenarios.bench.NonlinearBenchmark;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.concurrent.Callable;
import org.littoral.scenarios.input.UserInputException;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code littoral bench NAME}: speed and memory figures against the targets in the issues. */
@Command(name = "bench", description = "Run a benchmark and print its figures (median, spread, throughput, peak memory).")
public final class BenchCommand implements Callable<Integer> {

    /** Registered benchmarks, by name. Add new ones here. */
    static Map<String, Benchmark> registry() {
        Map<String, Benchmark> m = new LinkedHashMap<>();
        m.put("analysis", new AnalysisBenchmark());
        m.put("sweep", new org.littoral.scenarios.sweep.SweepBenchmark());
        m.put("sweep-nonlinear", org.littoral.scenarios.sweep.SweepBenchmark.nonlinear());
        m.put("nonlinear", new NonlinearBenchmark());
        m.put("linear", new LinearBenchmark());
        m.put("plan", new org.littoral.scenarios.plan.PlanBenchmark());
        m.put("check-timing", new org.littoral.scenarios.timing.TimingBenchmark());
        m.put("sensitivity", new org.littoral.scenarios.sensitivity.InfluenceBenchmark());
        m.put("gradual-turns", new org.littoral.scenarios.demo.GradualTurnSkill());
        m.put("input-fuzz", new InputFuzzBenchmark());
        m.put("memory-estimate", new MemoryEstimateBenchmark());
        return m;
    }

    @Parameters(index = "0", arity = "0..1", description = "Benchmark name; omit to list them.")
    String name;

    @Option(names = "--quick", description = "Fewer repetitions (for smoke tests).")
    boolean quick;

    @Override
    public Integer call() throws Exception {
        Map<String, Benchmark> reg = registry();
        if (name == null) {
            reg.values().forEach(b -> System.out.printf("%-12s %s%n", b.name(), b.description()));
            return 0;
        }
        Benchmark b = reg.get(name);
        if (b == null) {
            throw new UserInputException("unknown benchmark '" + name + "'; choose one of " + reg.keySet());
        }
        return b.run(System.out, quick);
    }
}
