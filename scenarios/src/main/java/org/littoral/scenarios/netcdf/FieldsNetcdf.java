package org.littoral.scenarios.netcdf;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.littoral.model.coast.SurfaceMap;
import org.littoral.model.field.BreezeSolution;
import org.littoral.model.field.Snapshot;
import org.littoral.scenarios.output.AtomicFile;
import org.littoral.model.front.FarFieldSolution;
import ucar.ma2.Array;
import ucar.ma2.ArrayFloat;
import ucar.ma2.ArrayByte;
import ucar.ma2.DataType;
import ucar.ma2.InvalidRangeException;
import ucar.nc2.Attribute;
import ucar.nc2.Dimension;
import ucar.nc2.NetcdfFileWriter;
import ucar.nc2.Variable;

/**
 * {@code fields.nc}: the model's height-distance fields at the output times, CF-1.8, netCDF-3 64-bit offset
 * (readable by every netCDF library, ncdump and xarray). Variables on (time, z, x): u, v, w, theta, water-vapour
 * mixing ratio and the pressure perturbation, all TOTAL values as the model hands them over (ambient wind and
 * background included), with coordinate variables time, z, x and the land mask along x. One time level is
 * evaluated, converted and written at a time, so memory stays at one snapshot.
 */
public final class FieldsNetcdf {
    public static final String FILE_NAME = "fields.nc";

    private FieldsNetcdf() {
    }

    /**
     * Writes the fields at the given output times atomically.
     *
     * @param clockH output times, local clock hours since local midnight of model day 0
     * @param modelSec the same times as model (solar) seconds, as the solution takes them
     */
    public static void write(Path target, BreezeSolution sol, SurfaceMap surface, double[] clockH, double[] modelSec,
                             CfFile.Provenance p) throws IOException {
        AtomicFile.writeWith(target, tmp -> {
            try {
                writeFile(tmp, sol, surface, clockH, modelSec, p);
            } catch (InvalidRangeException e) {
                throw new IllegalStateException("netCDF slab outside its variable (a bug): " + e.getMessage(), e);
            }
        });
    }

    private static void writeFile(Path path, BreezeSolution sol, SurfaceMap surface, double[] clockH, double[] modelSec,
                                  CfFile.Provenance p) throws IOException, InvalidRangeException {
        double[] xM = sol.xM();
        double[] zM = sol.zM();
        int nt = clockH.length;
        int nz = zM.length;
        int nx = xM.length;
        NetcdfFileWriter w = NetcdfFileWriter.createNew(NetcdfFileWriter.Version.netcdf3, path.toString());
        try {
            w.setLargeFile(true); // CDF-2, 64-bit offsets: a large grid passes 2 GiB
            w.setFill(false); // every value is written
            Dimension dt = w.addDimension(null, "time", nt);
            Dimension dz = w.addDimension(null, "z", nz);
            Dimension dx = w.addDimension(null, "x", nx);
            Variable vt = CfFile.timeVariable(w, "time", dt, p.coast(), "time of the model fields");
            Variable vz = CfFile.doubleVariable(w, "z", List.of(dz), "m", "height", "height above the surface");
            vz.addAttribute(new Attribute("positive", "up"));
            vz.addAttribute(new Attribute("axis", "Z"));
            Variable vx = CfFile.doubleVariable(w, "x", List.of(dx), "m", null,
                    "cross-shore distance from the coastline, positive inland");
            vx.addAttribute(new Attribute("axis", "X"));
            Variable vLand = w.addVariable(null, "land", DataType.BYTE, List.of(dx));
            vLand.addAttribute(new Attribute("standard_name", "land_binary_mask"));
            vLand.addAttribute(new Attribute("long_name", "1 over land, 0 over water"));
            vLand.addAttribute(new Attribute("units", "1"));
            List<Dimension> txz = List.of(dt, dz, dx);
            Variable[] vars = {
                CfFile.floatVariable(w, "u", txz, "m s-1", "x_wind", "cross-shore wind, positive onshore (towards +x, inland)"),
                CfFile.floatVariable(w, "v", txz, "m s-1", "y_wind", "alongshore wind, positive 90 degrees to the left of +x"),
                CfFile.floatVariable(w, "w", txz, "m s-1", "upward_air_velocity", "vertical wind"),
                CfFile.floatVariable(w, "theta", txz, "K", "air_potential_temperature", "potential temperature"),
                CfFile.floatVariable(w, "mixing_ratio", txz, "kg kg-1", "humidity_mixing_ratio", "water-vapour mixing ratio"),
                CfFile.floatVariable(w, "pressure_perturbation", txz, "Pa", null,
                        "pressure minus the hydrostatic pressure of the background state"),
            };
            String comment = "Fields of the " + p.modelName() + " model on the model grid, x cross-shore (0 at the coastline, "
                    + "positive inland) and z up; winds and scalars are total values (ambient wind and background included).";
            CfFile.globalAttributes(w, p, comment);
            if (sol instanceof FarFieldSolution far) {
                w.addGroupAttribute(null, new Attribute("interior_from_m", far.interiorFromM()));
                w.addGroupAttribute(null, new Attribute("interior_to_m", far.interiorToM()));
                w.addGroupAttribute(null, new Attribute("interior_note", "columns outside interior_from_m..interior_to_m lie in the "
                        + "far-field sponges that damp the flow towards the far field; do not interpret them"));
            }
            w.create();

            w.write(vz, Array.factory(zM.clone()));
            w.write(vx, Array.factory(xM.clone()));
            double[] land = surface.landMask(xM);
            ArrayByte.D1 mask = new ArrayByte.D1(nx);
            for (int i = 0; i < nx; i++) {
                mask.set(i, (byte) (land[i] > 0.5 ? 1 : 0));
            }
            w.write(vLand, mask);
            double[] t = new double[nt];
            for (int n = 0; n < nt; n++) {
                t[n] = CfFile.secondsFromClockHours(p.coast(), clockH[n]);
            }
            w.write(vt, Array.factory(t));

            ArrayFloat.D3 slab = new ArrayFloat.D3(1, nz, nx);
            float[] store = (float[]) slab.getStorage();
            int[] origin = new int[3];
            for (int n = 0; n < nt; n++) {
                Snapshot s = sol.snapshotAt(modelSec[n]);
                double[][] fields = {s.uMPerS(), s.vMPerS(), s.wMPerS(), s.thetaK(), s.mixingRatioKgPerKg(), s.pressurePerturbationPa()};
                origin[0] = n;
                for (int f = 0; f < vars.length; f++) {
                    double[] a = fields[f];
                    for (int j = 0; j < store.length; j++) {
                        store[j] = CfFile.toFloat(a[j]);
                    }
                    w.write(vars[f], origin, slab);
                }
            }
        } finally {
            w.close();
        }
    }
}
