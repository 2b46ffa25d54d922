package org.twinorbit.harness.score;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.twinorbit.harness.BadInputException;
import org.twinorbit.harness.export.CaseExport;

/**
 * A trajectory written back by an outside code, checked line by line: the header
 * {@link CaseExport#TRAJECTORY_COLUMNS}, numbers everywhere, the phases the run asked for, each
 * phase's samples in order at t = k·dt from t = 0, and as many as the run has steps (fewer only
 * when the particle left the field's domain). Every problem is a {@link BadInputException}
 * naming the file, the line and what is wrong.
 */
public final class TrajectoryFile {

    /** Sample times may differ from k·dt by this fraction of dt (a code accumulating t += dt). */
    static final double TIME_SLACK = 1e-6;

    /** One phase's samples: times (s), positions (m) and u = γv (m/s), row per sample. */
    public record Series(double[] t, double[][] x, double[][] u) {
        public int size() {
            return t.length;
        }
    }

    private TrajectoryFile() {}

    /**
     * @param file   the trajectory file
     * @param phases the phases it must hold
     * @param dt     the run's step (s)
     * @param steps  the run's step count: each phase has steps + 1 samples
     * @return the samples by phase
     */
    public static Map<Integer, Series> read(Path file, List<Integer> phases, double dt, long steps) {
        List<String> lines = lines(file, CaseExport.TRAJECTORY_COLUMNS);
        String where = "trajectory " + file.getFileName();
        Map<Integer, List<double[]>> rows = new LinkedHashMap<>();
        for (int i = 1; i < lines.size(); i++) {
            String line = lines.get(i).trim();
            if (line.isEmpty()) {
                continue;
            }
            String[] parts = line.split("\\s*,\\s*");
            int n = i + 1;
            if (parts.length != CaseExport.TRAJECTORY_COLUMNS.size()) {
                throw new BadInputException(where + " line " + n + ": " + CaseExport.TRAJECTORY_COLUMNS.size()
                        + " columns expected, got " + parts.length);
            }
            int phase;
            try {
                phase = Integer.parseInt(parts[0]);
            } catch (NumberFormatException e) {
                throw new BadInputException(where + " line " + n + ": phase '" + parts[0] + "' is not a whole number");
            }
            if (!phases.contains(phase)) {
                throw new BadInputException(where + " line " + n + ": phase " + phase + " is not one of this run's "
                        + phases);
            }
            double[] v = new double[7];
            for (int c = 1; c < 8; c++) {
                try {
                    v[c - 1] = Double.parseDouble(parts[c]);
                } catch (NumberFormatException e) {
                    throw new BadInputException(where + " line " + n + ": " + CaseExport.TRAJECTORY_COLUMNS.get(c) + " '"
                            + parts[c] + "' is not a number");
                }
                if (!Double.isFinite(v[c - 1])) {
                    throw new BadInputException(where + " line " + n + ": " + CaseExport.TRAJECTORY_COLUMNS.get(c)
                            + " is " + parts[c] + " at t = " + parts[1] + " s (phase " + phase + ")");
                }
            }
            List<double[]> list = rows.computeIfAbsent(phase, k -> new ArrayList<>());
            long k = list.size();
            if (Math.abs(v[0] - k * dt) > TIME_SLACK * dt) {
                throw new BadInputException(where + " line " + n + ": phase " + phase + " sample " + k + " is at t = "
                        + parts[1] + " s, expected " + (k * dt) + " s (one sample per step of dt = " + dt
                        + " s from t = 0, in order)");
            }
            list.add(v);
        }
        Map<Integer, Series> out = new LinkedHashMap<>();
        for (int phase : phases) {
            List<double[]> list = rows.get(phase);
            if (list == null) {
                throw new BadInputException(where + ": phase " + phase + " is missing (the run asks for phases " + phases + ")");
            }
            if (list.size() > steps + 1) {
                throw new BadInputException(where + ": phase " + phase + " has " + list.size() + " samples, the run has "
                        + (steps + 1) + " (t = 0 and " + steps + " steps)");
            }
            int m = list.size();
            double[] t = new double[m];
            double[][] x = new double[m][];
            double[][] u = new double[m][];
            for (int i = 0; i < m; i++) {
                double[] v = list.get(i);
                t[i] = v[0];
                x[i] = new double[] {v[1], v[2], v[3]};
                u[i] = new double[] {v[4], v[5], v[6]};
            }
            out.put(phase, new Series(t, x, u));
        }
        return out;
    }

    /**
     * The lines of a trajectory file whose first line is the header of {@code columns}, shared by
     * the full-orbit and guiding-center readers.
     */
    static List<String> lines(Path file, List<String> columns) {
        List<String> lines;
        try {
            lines = Files.readAllLines(file);
        } catch (IOException e) {
            throw new BadInputException("trajectory: cannot read " + file + " (" + e.getMessage() + ")");
        }
        String header = String.join(",", columns);
        if (lines.isEmpty() || !lines.get(0).trim().replace(" ", "").equals(header)) {
            throw new BadInputException("trajectory " + file.getFileName() + ": the first line must be the header "
                    + header + (lines.isEmpty() ? " (the file is empty)" : ", got '" + lines.get(0).trim() + "'"));
        }
        return lines;
    }
}
