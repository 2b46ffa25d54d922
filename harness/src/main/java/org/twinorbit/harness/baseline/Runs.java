package org.twinorbit.harness.baseline;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;
import org.twinorbit.harness.cases.Case;
import org.twinorbit.harness.run.CaseResult;
import org.twinorbit.harness.run.CaseRunner;
import org.twinorbit.harness.run.Registry;
import org.twinorbit.harness.scan.ScanProgress;
import org.twinorbit.harness.scan.ScanRequest;
import org.twinorbit.harness.scan.ScanResult;
import org.twinorbit.harness.suite.ValidationSuite;
import org.twinorbit.harness.verdict.RowVerdict;
import org.twinorbit.harness.verdict.Verdicts;

/**
 * Runs what a baseline holds — the same code the run, suite and scan commands use — and returns
 * its rows; both {@code baseline} (first time) and {@code check} (again) come through here.
 */
public final class Runs {

    private Runs() {}

    /** The rows of the cases, judged as {@code kind} judges them (a suite with its expected failures). */
    public static List<MeasuredRow> cases(List<Case> cases, Baseline.Kind kind, int threads, boolean quiet) {
        List<CaseResult> results = new CaseRunner(threads, quiet).run(cases);
        List<RowVerdict> verdicts;
        if (kind == Baseline.Kind.RUN) {
            verdicts = new ArrayList<>();
            results.forEach(r -> verdicts.addAll(Verdicts.judge(r)));
        } else {
            verdicts = ValidationSuite.verdicts(results, kind == Baseline.Kind.SUITE_QUICK);
        }
        return Measurements.of(results, verdicts);
    }

    /** The rows of a scan, its files written to a temporary directory that is removed afterwards. */
    public static List<MeasuredRow> scan(ScanRequest.Built built, String caseName, int threads) {
        Path tmp;
        try {
            tmp = Files.createTempDirectory("twinorbit-check-scan");
        } catch (IOException e) {
            throw new UncheckedIOException("cannot create a temporary directory for the scan", e);
        }
        try {
            ScanResult r = built.scan().run(built.evaluator(), tmp, false, threads, ScanProgress.NONE);
            return Measurements.of(r, caseName);
        } finally {
            delete(tmp);
        }
    }

    /** Runs a baseline's cases or scan again with this build. */
    public static List<MeasuredRow> again(Baseline b, int threads, boolean quiet) {
        if (b.kind() == Baseline.Kind.SCAN) {
            ScanRequest q = ScanDefinition.read(b.scan(), new JsonFields("baseline"), threads);
            return scan(q.build(), ScanDefinition.caseName(b.scan()), threads);
        }
        return cases(b.cases().stream().map(Runs::available).toList(), b.kind(), threads, quiet);
    }

    /**
     * The case without integrators this class path lacks: their rows are then reported missing
     * (a regression), rather than the whole check refused.
     */
    static Case available(Case c) {
        List<String> pushers = c.pushers().stream().filter(Registry.pusherNames()::contains).toList();
        List<String> gc = c.gcIntegrators().stream().filter(Registry.guidingCenterNames()::contains).toList();
        return new Case(c.name(), c.field(), c.fieldParameters(), c.species(), c.start(), c.energyEv(), c.eps(),
                c.pitchDeg(), c.phases(), c.duration(), c.durationUnit(), pushers, c.stepsPerGyro(), gc,
                c.gcStepGyro(), c.referenceRtol(), c.gcStart());
    }

    /** A scan's definition as the JSON tree a baseline stores. */
    public static JsonNode scanDefinition(ScanRequest.Built built, org.twinorbit.shared.Species species) {
        return new ObjectMapper().valueToTree(ScanDefinition.write(built.scan(), species));
    }

    /** The case name of a scan's rows. */
    public static String scanCaseName(JsonNode definition) {
        return ScanDefinition.caseName(definition);
    }

    private static void delete(Path dir) {
        try (Stream<Path> s = Files.walk(dir)) {
            for (Path p : s.sorted(Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        } catch (IOException ignored) {
            // a leftover temporary directory is harmless
        }
    }
}
