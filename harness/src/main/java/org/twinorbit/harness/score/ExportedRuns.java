package org.twinorbit.harness.score;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.twinorbit.harness.BadInputException;
import org.twinorbit.harness.cases.Case;
import org.twinorbit.harness.cases.CaseSpec;
import org.twinorbit.harness.export.CaseExport;
import org.twinorbit.harness.run.CaseRunner;
import org.twinorbit.harness.run.Registry;
import org.twinorbit.harness.run.RunSchedule;

/**
 * An exported case read back with the outside code's trajectories: the case rebuilt from the
 * manifest's definition, checked against what this version would run (steps, step sizes,
 * initial states), and the trajectories as a {@link ReplayPusher}.
 *
 * @param c      the case, with no built-in pusher (and, when guiding centers are scored, no
 *               built-in guiding-center integrator)
 * @param pusher the full-orbit trajectories, played back; null when guiding centers are scored
 * @param gc     the guiding-center trajectories, played back; null when full orbits are scored
 */
public record ExportedRuns(Case c, ReplayPusher pusher, ReplayGuidingCenter gc) {

    private static final ObjectMapper JSON = new ObjectMapper();

    /**
     * @param caseDir      the directory {@code export} wrote (manifest.json)
     * @param trajectories the directory holding the trajectory files the manifest names
     * @param name         the outside scheme's name in reports
     * @param order        its declared order
     * @param properties   its declared properties
     */
    public static ExportedRuns read(Path caseDir, Path trajectories, String name, int order, Set<String> properties) {
        JsonNode m = manifest(caseDir);
        Case c = rebuild(m, caseDir, false);
        RunSchedule s = CaseRunner.schedule(c);
        List<ReplayPusher.Recording> recordings = new ArrayList<>();
        for (JsonNode run : m.withArray("runs")) {
            double dt = run.path("dt_s").asDouble();
            long steps = run.path("steps").asLong();
            int level = run.path("level").isNull() ? 0 : run.path("level").asInt();
            double expectedDt = s.convergenceDt()[level];
            long expectedSteps = run.path("purpose").asText().equals("main") ? s.steps() : s.convergenceSteps()[level];
            if (Math.abs(dt - expectedDt) > 1e-12 * expectedDt || steps != expectedSteps) {
                throw new BadInputException("--export: run '" + run.path("trajectory_file").asText() + "' asks for "
                        + steps + " steps of " + dt + " s, this version runs " + expectedSteps + " of " + expectedDt
                        + " s; export the case again with this version");
            }
            List<Integer> phases = new ArrayList<>();
            run.withArray("phases").forEach(p -> phases.add(p.asInt()));
            Path csv = trajectories.resolve(run.path("trajectory_file").asText());
            Path h5 = hdf5(csv);
            Map<Integer, TrajectoryFile.Series> series = h5 != null ? Hdf5Trajectories.fullOrbit(h5, phases, dt, steps)
                    : TrajectoryFile.read(csv, phases, dt, steps);
            List<TrajectoryFile.Series> byPhase = new ArrayList<>();
            for (int k = 0; k < s.x0().length; k++) {
                TrajectoryFile.Series one = series.get(k);
                if (one != null) {
                    checkStart(run.path("trajectory_file").asText(), k, one, s.x0()[k], s.u0()[k]);
                }
                byPhase.add(one);
            }
            recordings.add(new ReplayPusher.Recording(dt, byPhase));
        }
        return new ExportedRuns(c, new ReplayPusher(name, order, properties, recordings), null);
    }

    /** As {@link #read}, for an outside guiding-center integrator's trajectories. */
    public static ExportedRuns readGuidingCenter(Path caseDir, Path trajectories, String name, int order,
                                                 Set<String> properties) {
        JsonNode m = manifest(caseDir);
        Case c = rebuild(m, caseDir, true);
        RunSchedule.GuidingCenterRuns g = CaseRunner.schedule(c).guidingCenter();
        JsonNode gc = m.path("guiding_center");
        if (gc.isMissingNode()) {
            throw new BadInputException("--export: " + caseDir.resolve("manifest.json") + " has no guiding_center "
                    + "section; export the case again with this version");
        }
        List<ReplayGuidingCenter.Recording> recordings = new ArrayList<>();
        for (JsonNode run : gc.withArray("runs")) {
            int level = run.path("level").asInt();
            double dt = run.path("dt_s").asDouble();
            long steps = run.path("steps").asLong();
            if (level >= g.dt().length || Math.abs(dt - g.dt()[level]) > 1e-12 * g.dt()[level] || steps != g.steps()[level]) {
                throw new BadInputException("--export: guiding-center run '" + run.path("trajectory_file").asText()
                        + "' asks for " + steps + " steps of " + dt + " s, this version runs a different one; export the "
                        + "case again with this version");
            }
            String file = run.path("trajectory_file").asText();
            Path h5 = hdf5(trajectories.resolve(file));
            GuidingCenterTrajectory t = h5 != null ? Hdf5Trajectories.guidingCenter(h5, dt, steps)
                    : GuidingCenterTrajectory.read(trajectories.resolve(file), dt, steps);
            double sx = Math.max(Math.abs(g.x0()[0]), Math.max(Math.abs(g.x0()[1]), Math.abs(g.x0()[2])));
            for (int i = 0; i < 3; i++) {
                if (Math.abs(t.x()[0][i] - g.x0()[i]) > 1e-12 * sx) {
                    throw new BadInputException("trajectory " + file + ": does not start at the exported guiding center "
                            + "(gc-start.csv); its first sample must be the state at t = 0");
                }
            }
            if (Math.abs(t.pPar()[0] - g.pPar0()) > 1e-12 * Math.abs(g.pPar0()) + 1e-300) {
                throw new BadInputException("trajectory " + file + ": does not start at the exported p_par (gc-start.csv)");
            }
            recordings.add(new ReplayGuidingCenter.Recording(dt, t));
        }
        return new ExportedRuns(c, null, new ReplayGuidingCenter(name, order, properties, recordings));
    }

    /** The .h5 file with the CSV's base name, when there is no CSV and there is one; else null. */
    private static Path hdf5(Path csv) {
        String n = csv.getFileName().toString();
        Path h5 = csv.resolveSibling(n.endsWith(".csv") ? n.substring(0, n.length() - 4) + ".h5" : n + ".h5");
        return !Files.exists(csv) && Files.exists(h5) ? h5 : null;
    }

    private static JsonNode manifest(Path caseDir) {
        Path manifestFile = caseDir.resolve("manifest.json");
        JsonNode m;
        try {
            m = JSON.readTree(Files.readString(manifestFile));
        } catch (IOException e) {
            throw new BadInputException("--export: cannot read " + manifestFile + " (" + e.getMessage() + ")");
        }
        if (m == null || !"twinorbit-case-export".equals(m.path("schema").asText())) {
            throw new BadInputException("--export: " + manifestFile + " is not a case export (schema twinorbit-case-export)");
        }
        if (m.path("schema_version").asInt() != CaseExport.SCHEMA_VERSION) {
            throw new BadInputException("--export: " + manifestFile + " has schema_version " + m.path("schema_version")
                    + ", this version reads " + CaseExport.SCHEMA_VERSION + "; export the case again");
        }
        return m;
    }

    /** The case of the manifest, without built-in pushers (and GC integrators when those are scored). */
    private static Case rebuild(JsonNode m, Path caseDir, boolean guidingCenters) {
        CaseSpec spec;
        try {
            spec = JSON.convertValue(m.get("definition"), CaseSpec.class);
        } catch (IllegalArgumentException e) {
            throw new BadInputException("--export: the definition in " + caseDir.resolve("manifest.json")
                    + " is not a case (" + e.getMessage() + ")");
        }
        spec.pushers = List.of("none");
        if (guidingCenters) {
            spec.gcIntegrators = List.of("none");
        }
        return spec.toCase(Registry.pusherNames(), Registry.guidingCenterNames());
    }


    /** The first sample must be the exported initial state (to 1e-12 of its size: a written and re-read double). */
    private static void checkStart(String file, int phase, TrajectoryFile.Series s, double[] x0, double[] u0) {
        for (int i = 0; i < 3; i++) {
            double sx = Math.max(Math.abs(x0[0]), Math.max(Math.abs(x0[1]), Math.abs(x0[2])));
            double su = Math.max(Math.abs(u0[0]), Math.max(Math.abs(u0[1]), Math.abs(u0[2])));
            if (Math.abs(s.x()[0][i] - x0[i]) > 1e-12 * sx || Math.abs(s.u()[0][i] - u0[i]) > 1e-12 * su) {
                throw new BadInputException("trajectory " + file + ": phase " + phase + " does not start at the exported "
                        + "initial state (initial-states.csv); its first sample must be the state at t = 0");
            }
        }
    }
}
