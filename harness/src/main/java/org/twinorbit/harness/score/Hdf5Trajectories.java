package org.twinorbit.harness.score;

import io.jhdf.HdfFile;
import io.jhdf.api.Dataset;
import io.jhdf.api.Node;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.twinorbit.harness.BadInputException;

/**
 * Trajectories written back as HDF5 instead of CSV (same base name, {@code .h5}), read with the
 * pure-Java jHDF library and checked as the CSV files are. Layout, all datasets 64-bit floats:
 * <pre>
 * full orbits       /phase_K/t_s [n], /phase_K/x_m [n][3], /phase_K/u_m_per_s [n][3]  (one group per phase K)
 * guiding centers   /t_s [n], /x_m [n][3], /p_par_kg_m_per_s [n]
 * </pre>
 */
public final class Hdf5Trajectories {

    private Hdf5Trajectories() {}

    /** The phases' series of a full-orbit run. */
    public static Map<Integer, TrajectoryFile.Series> fullOrbit(Path file, List<Integer> phases, double dt, long steps) {
        String where = "trajectory " + file.getFileName();
        Map<Integer, TrajectoryFile.Series> out = new LinkedHashMap<>();
        try (HdfFile h = new HdfFile(file)) {
            for (int k : phases) {
                Node g = h.getChild("phase_" + k);
                if (g == null) {
                    throw new BadInputException(where + ": group phase_" + k + " is missing (the run asks for phases "
                            + phases + ")");
                }
                double[] t = vector(h, "/phase_" + k + "/t_s", where);
                double[][] x = rows(h, "/phase_" + k + "/x_m", where, t.length);
                double[][] u = rows(h, "/phase_" + k + "/u_m_per_s", where, t.length);
                for (int i = 0; i < t.length; i++) {
                    check(where, "phase " + k, i, t[i], dt, x[i], u[i]);
                }
                counts(where, "phase " + k, t.length, steps);
                out.put(k, new TrajectoryFile.Series(t, x, u));
            }
        } catch (BadInputException e) {
            throw e;
        } catch (RuntimeException e) {
            throw new BadInputException(where + ": not a readable HDF5 trajectory (" + e.getMessage() + ")");
        }
        return out;
    }

    /** A guiding-center run. */
    public static GuidingCenterTrajectory guidingCenter(Path file, double dt, long steps) {
        String where = "trajectory " + file.getFileName();
        try (HdfFile h = new HdfFile(file)) {
            double[] t = vector(h, "/t_s", where);
            double[][] x = rows(h, "/x_m", where, t.length);
            double[] p = vector(h, "/p_par_kg_m_per_s", where);
            if (p.length != t.length) {
                throw new BadInputException(where + ": p_par_kg_m_per_s has " + p.length + " samples, t_s " + t.length);
            }
            for (int i = 0; i < t.length; i++) {
                check(where, "the run", i, t[i], dt, x[i], new double[] {p[i]});
            }
            counts(where, "the run", t.length, steps);
            return new GuidingCenterTrajectory(t, x, p);
        } catch (BadInputException e) {
            throw e;
        } catch (RuntimeException e) {
            throw new BadInputException(where + ": not a readable HDF5 trajectory (" + e.getMessage() + ")");
        }
    }

    private static double[] vector(HdfFile h, String path, String where) {
        Object d = data(h, path, where);
        if (!(d instanceof double[] v)) {
            throw new BadInputException(where + ": " + path + " must be a 1-D array of 64-bit floats");
        }
        return v;
    }

    private static double[][] rows(HdfFile h, String path, String where, int n) {
        Object d = data(h, path, where);
        if (!(d instanceof double[][] v) || v.length != n || (n > 0 && v[0].length != 3)) {
            throw new BadInputException(where + ": " + path + " must be a " + n + " x 3 array of 64-bit floats");
        }
        return v;
    }

    private static Object data(HdfFile h, String path, String where) {
        Dataset d;
        try {
            d = h.getDatasetByPath(path);
        } catch (RuntimeException e) {
            throw new BadInputException(where + ": dataset " + path + " is missing");
        }
        return d.getData();
    }

    private static void check(String where, String what, int k, double t, double dt, double[] x, double[] u) {
        for (double v : new double[] {t, x[0], x[1], x[2]}) {
            if (!Double.isFinite(v)) {
                throw new BadInputException(where + ": " + what + " sample " + k + " is not finite at t = " + t + " s");
            }
        }
        for (double v : u) {
            if (!Double.isFinite(v)) {
                throw new BadInputException(where + ": " + what + " sample " + k + " is not finite at t = " + t + " s");
            }
        }
        if (Math.abs(t - k * dt) > TrajectoryFile.TIME_SLACK * dt) {
            throw new BadInputException(where + ": " + what + " sample " + k + " is at t = " + t + " s, expected "
                    + (k * dt) + " s (one sample per step of dt = " + dt + " s from t = 0, in order)");
        }
    }

    private static void counts(String where, String what, int n, long steps) {
        if (n == 0) {
            throw new BadInputException(where + ": " + what + " has no samples");
        }
        if (n > steps + 1) {
            throw new BadInputException(where + ": " + what + " has " + n + " samples, the run has " + (steps + 1));
        }
    }
}
