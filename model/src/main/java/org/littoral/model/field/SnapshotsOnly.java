package org.littoral.model.field;

/**
 * A view of a solution that offers only {@link BreezeSolution#snapshotAt} (none of its
 * {@link FieldSampling} fast paths), so a consumer falls back to whole snapshots. Used to check that a
 * fast path gives the same numbers as the snapshot path.
 */
public record SnapshotsOnly(BreezeSolution solution) implements BreezeSolution {
    @Override
    public double[] xM() {
        return solution.xM();
    }

    @Override
    public double[] zM() {
        return solution.zM();
    }

    @Override
    public Background background() {
        return solution.background();
    }

    @Override
    public double startSec() {
        return solution.startSec();
    }

    @Override
    public double endSec() {
        return solution.endSec();
    }

    @Override
    public Snapshot snapshotAt(double timeSec) {
        return solution.snapshotAt(timeSec);
    }

    @Override
    public String modelName() {
        return solution.modelName();
    }
}
