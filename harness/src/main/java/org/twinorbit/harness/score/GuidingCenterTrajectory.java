package org.twinorbit.harness.score;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.twinorbit.harness.BadInputException;
import org.twinorbit.harness.export.CaseExport;

/**
 * A guiding-center trajectory written back by an outside code, checked line by line like a
 * full-orbit one ({@link TrajectoryFile}): the header {@link CaseExport#GC_TRAJECTORY_COLUMNS},
 * finite numbers, samples at t = k·dt from t = 0 in order, at most steps + 1 of them.
 *
 * @param t    times (s)
 * @param x    guiding-center positions (m)
 * @param pPar parallel momenta (kg m/s)
 */
public record GuidingCenterTrajectory(double[] t, double[][] x, double[] pPar) {

    public int size() {
        return t.length;
    }

    /** @param dt the run's step (s) @param steps its step count */
    public static GuidingCenterTrajectory read(Path file, double dt, long steps) {
        List<String> lines = TrajectoryFile.lines(file, CaseExport.GC_TRAJECTORY_COLUMNS);
        String where = "trajectory " + file.getFileName();
        List<double[]> rows = new ArrayList<>();
        for (int i = 1; i < lines.size(); i++) {
            String line = lines.get(i).trim();
            if (line.isEmpty()) {
                continue;
            }
            String[] parts = line.split("\\s*,\\s*");
            int n = i + 1;
            if (parts.length != CaseExport.GC_TRAJECTORY_COLUMNS.size()) {
                throw new BadInputException(where + " line " + n + ": " + CaseExport.GC_TRAJECTORY_COLUMNS.size()
                        + " columns expected, got " + parts.length);
            }
            double[] v = new double[parts.length];
            for (int c = 0; c < parts.length; c++) {
                try {
                    v[c] = Double.parseDouble(parts[c]);
                } catch (NumberFormatException e) {
                    throw new BadInputException(where + " line " + n + ": " + CaseExport.GC_TRAJECTORY_COLUMNS.get(c)
                            + " '" + parts[c] + "' is not a number");
                }
                if (!Double.isFinite(v[c])) {
                    throw new BadInputException(where + " line " + n + ": " + CaseExport.GC_TRAJECTORY_COLUMNS.get(c)
                            + " is " + parts[c] + " at t = " + parts[0] + " s");
                }
            }
            long k = rows.size();
            if (Math.abs(v[0] - k * dt) > TrajectoryFile.TIME_SLACK * dt) {
                throw new BadInputException(where + " line " + n + ": sample " + k + " is at t = " + parts[0]
                        + " s, expected " + (k * dt) + " s (one sample per step of dt = " + dt + " s from t = 0, in order)");
            }
            rows.add(v);
        }
        if (rows.isEmpty()) {
            throw new BadInputException(where + ": no samples after the header");
        }
        if (rows.size() > steps + 1) {
            throw new BadInputException(where + ": " + rows.size() + " samples, the run has " + (steps + 1)
                    + " (t = 0 and " + steps + " steps)");
        }
        int m = rows.size();
        double[] t = new double[m];
        double[][] x = new double[m][];
        double[] p = new double[m];
        for (int i = 0; i < m; i++) {
            double[] v = rows.get(i);
            t[i] = v[0];
            x[i] = new double[] {v[1], v[2], v[3]};
            p[i] = v[4];
        }
        return new GuidingCenterTrajectory(t, x, p);
    }
}
