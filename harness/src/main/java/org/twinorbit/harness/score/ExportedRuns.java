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
 * @param c      the case, with no built-in pusher
 * @param pusher the trajectories, played back
 */
public record ExportedRuns(Case c, ReplayPusher pusher) {

    private static final ObjectMapper JSON = new ObjectMapper();

    /**
     * @param caseDir      the directory {@code export} wrote (manifest.json)
     * @param trajectories the directory holding the trajectory files the manifest names
     * @param name         the outside scheme's name in reports
     * @param order        its declared order
     * @param properties   its declared properties
     */
    public static ExportedRuns read(Path caseDir, Path trajectories, String name, int order, Set<String> properties) {
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
        CaseSpec spec;
        try {
            spec = JSON.convertValue(m.get("definition"), CaseSpec.class);
        } catch (IllegalArgumentException e) {
            throw new BadInputException("--export: the definition in " + manifestFile + " is not a case (" + e.getMessage() + ")");
        }
        spec.pushers = List.of("none");
        Case c = spec.toCase(Registry.pusherNames(), Registry.guidingCenterNames());
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
            Map<Integer, TrajectoryFile.Series> series = TrajectoryFile.read(
                    trajectories.resolve(run.path("trajectory_file").asText()), phases, dt, steps);
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
        return new ExportedRuns(c, new ReplayPusher(name, order, properties, recordings));
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
