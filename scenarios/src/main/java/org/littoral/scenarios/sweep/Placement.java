package org.littoral.scenarios.sweep;

import java.io.PrintStream;
import java.nio.file.Path;
import java.util.List;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.scenarios.run.WorkEstimate;

/**
 * Where the members of a sweep (or of a plan's or a timing check's ensemble, which run through the same
 * {@link SweepExecutor}) are computed. A local run computes them all here. On a batch system the work is split into
 * shards: one process per shard computes its share into the shared output folder (each member file atomic, so the
 * shards never see half a result), and a final merge step computes nothing and combines what the shards wrote into
 * the tables and figures. The submitting process computes nothing either: it hands the members that still need a
 * result to a {@link Dispatcher}.
 */
public sealed interface Placement {

    /** Every member, here (the default). */
    record AllHere() implements Placement {
    }

    /**
     * One shard of {@code count}: the members whose 0-based index {@code i} has {@code i mod count == index - 1}.
     * Dealing the members out in turn, rather than in blocks, gives every shard a similar mix of the first axis (which
     * varies slowest), so that cheap and dear members (weak and strong winds, say) are spread over the shards.
     *
     * @param index 1-based shard number, 1..count
     */
    record Shard(int index, int count) implements Placement {
        public Shard {
            if (count < 1 || index < 1 || index > count) {
                throw new UserInputException("--shard " + index + "/" + count + ": the shard number must be 1.." + count
                        + " and the count at least 1, e.g. --shard 3/8");
            }
        }

        /** Whether this shard computes member m. */
        public boolean owns(Member m) {
            return m.index() % count == index - 1;
        }

        /** The members of this shard, in sweep order. */
        public List<Member> of(List<Member> members) {
            return members.stream().filter(this::owns).toList();
        }

        /** {@code 3/8}. */
        public String label() {
            return index + "/" + count;
        }

        /**
         * Reads {@code K/N}.
         *
         * @param option the option name, for the message
         */
        public static Shard parse(String text, String option) {
            String t = text == null ? "" : text.trim();
            int slash = t.indexOf('/');
            try {
                if (slash > 0) {
                    return new Shard(Integer.parseInt(t.substring(0, slash).trim()), Integer.parseInt(t.substring(slash + 1).trim()));
                }
            } catch (NumberFormatException e) {
                // the message below
            }
            throw new UserInputException(option + " " + org.littoral.scenarios.input.Shown.bare(t) + ": give the shard "
                    + "as NUMBER/COUNT, e.g. " + option + " 3/8 (the third of eight shards)");
        }
    }

    /**
     * None: combine the results the shards wrote. Members without a result stop the run; {@code whyMissing} describes
     * them (which shard, what the scheduler says about its task, where its log is) in lines for the log.
     */
    record MergeOnly(MissingReport whyMissing) implements Placement {
    }

    /** None here: the members that still need a result go to a batch system. */
    record Dispatch(Dispatcher dispatcher) implements Placement {
    }

    /** Describes members that have no result, for the merge step. */
    @FunctionalInterface
    interface MissingReport {
        /** Lines explaining the missing members (printed one per line before the run stops). */
        List<String> explain(List<Member> missing, int memberCount);
    }

    /**
     * What a dispatcher is given.
     *
     * @param spec the sweep, plan or timing ensemble
     * @param members all members
     * @param todo the members without a valid result (all of them on a fresh folder)
     * @param outDir the shared output folder
     * @param largest the work estimate of the largest member (memory per task), or null if the caller has none
     * @param log where notes go
     */
    record Request(SweepSpec spec, List<Member> members, List<Member> todo, Path outDir, WorkEstimate largest, PrintStream log) {
    }

    /** Hands members to a batch system (writes job scripts, submits them). */
    @FunctionalInterface
    interface Dispatcher {
        void dispatch(Request request);
    }

    /** Whether every member is computed by this process (the only case in which a memory check against this JVM means anything). */
    default boolean runsAllHere() {
        return this instanceof AllHere;
    }

    /** Whether this process ends with every member's result in hand (local run or merge), so tables and figures can be made. */
    default boolean completes() {
        return this instanceof AllHere || this instanceof MergeOnly;
    }

    /** Members this process computes at the same time, for the memory check: the threads here, none when it computes nothing. */
    default int concurrentHere(int threads) {
        return this instanceof AllHere || this instanceof Shard ? threads : 0;
    }

    Placement ALL_HERE = new AllHere();
}
