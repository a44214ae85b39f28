package org.littoral.model.linear;

import org.littoral.model.coast.Coast;
import org.littoral.model.coast.SurfaceMap;
import org.littoral.model.grid.HorizontalGrid;
import org.littoral.model.grid.VerticalGrid;

/** Small configurations shared by the linear-model tests. */
final class LinearTestConfigs {
    private LinearTestConfigs() {
    }

    static HeatingSpec.ClassicShape classic(double amplitudeKPerS, double x0M, double depthM) {
        return new HeatingSpec.ClassicShape(amplitudeKPerS, x0M, depthM, 6.0);
    }

    static LinearConfig config(double latDeg, HeatingSpec heat, int nx, double dxM, int nz, double topM, double alpha,
                               double ambientU, boolean hydrostatic, int harmonics) {
        return new LinearConfig(new Coast(latDeg, 0, 0, 270, 180), SurfaceMap.simpleCoast(293, 0.2, 1, 0.1),
                HorizontalGrid.centred(nx, dxM), VerticalGrid.uniform(nz, topM), 0.01, alpha, alpha, ambientU,
                hydrostatic, harmonics, heat, 300, 0.01, -3e-6, 101325);
    }

    static LinearConfig classic45(double amplitude) {
        return config(45, classic(amplitude, 10e3, 1000), 256, 4000, 21, 4000, 1e-5, 0, true, 1);
    }
}
