package org.littoral.model.grid;

/** Uniform cross-shore grid: nx points spaced dxM, the first at x0M (x = 0 at the coast, inland positive). */
public record HorizontalGrid(int nx, double dxM, double x0M) {
    public HorizontalGrid {
        if (nx < 4) {
            throw new IllegalArgumentException("horizontal grid needs at least 4 points; got " + nx);
        }
        if (!(dxM > 0)) {
            throw new IllegalArgumentException("horizontal grid spacing must be positive; got " + dxM + " m");
        }
    }

    /** nx points centred on the coast: x from -nx/2 dx to (nx/2 - 1) dx (natural for a periodic FFT domain). */
    public static HorizontalGrid centred(int nx, double dxM) {
        return new HorizontalGrid(nx, dxM, -(nx / 2) * dxM);
    }

    public double xM(int i) {
        return x0M + i * dxM;
    }

    public double[] pointsM() {
        double[] x = new double[nx];
        for (int i = 0; i < nx; i++) {
            x[i] = xM(i);
        }
        return x;
    }

    public double lengthM() {
        return nx * dxM;
    }

    public double lastM() {
        return xM(nx - 1);
    }
}
