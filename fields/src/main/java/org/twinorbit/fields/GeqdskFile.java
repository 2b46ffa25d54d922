package org.twinorbit.fields;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * G-EQDSK equilibrium files, the open format of the trade: a first line of 48 characters of text
 * and three integers (a code, nw, nh), then 20 scalars (rdim, zdim, rcentr, rleft, zmid; rmaxis,
 * zmaxis, simag, sibry, bcentr; current, simag, –, rmaxis, –; zmaxis, –, sibry, –, –), the
 * profiles fpol, pres, ffprim, pprime (nw each), psirz (nw × nh, R fastest), qpsi (nw), the counts
 * nbbbs and limitr, and the boundary and limiter as (R, Z) pairs; numbers five to a line in fields
 * of 16 characters (Fortran 5e16.9), which may touch ("1.0E+00-2.0E+00").
 *
 * <p>Reading is strict: a count, size or number that is missing, negative, not a number or not
 * finite, a file that ends early, a flat or non-monotonic ψ, a boundary off the grid or a magnetic
 * axis outside the limiter is refused with the line and the quantity named. A field of the
 * library is named {@code geqdsk:PATH} to load one ({@link Fields#create}); its parameter
 * {@code cocos} names the file's sign convention ({@link Cocos}, default {@value Cocos#DEFAULT}).
 */
public final class GeqdskFile {

    /** The prefix of a field name that names a G-EQDSK file. */
    public static final String PREFIX = "geqdsk:";
    /** The largest grid accepted per direction (a guard against a garbled size). */
    static final int MAX_NODES = 4097;

    private static final Pattern NUMBER = Pattern.compile("[+-]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eEdD][+-]?\\d+)?");
    private static final Pattern INTEGER = Pattern.compile("[+-]?\\d+");

    private GeqdskFile() {}

    /** Reads and checks a file. @throws FieldParameterException naming the file, line and quantity */
    public static GeqdskData parse(Path file) {
        String where = "field " + PREFIX + file;
        if (!Files.isRegularFile(file)) {
            throw new FieldParameterException(where + ": no such file");
        }
        List<String> text;
        try {
            text = Files.readAllLines(file, StandardCharsets.ISO_8859_1);
        } catch (IOException e) {
            throw new FieldParameterException(where + ": cannot be read (" + e.getMessage() + ")");
        }
        return new Reader(where, text).read();
    }

    /** Reads a file as a field. @param cocos the file's COCOS index */
    public static GeqdskField read(Path file, int cocos) {
        GeqdskData d = parse(file);
        return new GeqdskField(PREFIX + file, d, Cocos.of(cocos), "field " + PREFIX + file);
    }

    /** A cursor over the numbers of the file, line by line, that knows where it is. */
    private static final class Reader {
        private final String where;
        private final List<String> text;
        private int line;        // 0-based index of the current line
        private int pos;
        private final int[] lines = new int[GeqdskData.Block.values().length];

        Reader(String where, List<String> text) {
            this.where = where;
            this.text = text;
        }

        private FieldParameterException error(int lineIndex, String what, String message) {
            return new FieldParameterException(where + ": line " + (lineIndex + 1) + ": " + what + ": " + message);
        }

        /** Moves to the next token; false at the end of the file. */
        private boolean skipBlanks() {
            while (line < text.size()) {
                String s = text.get(line);
                while (pos < s.length() && Character.isWhitespace(s.charAt(pos))) {
                    pos++;
                }
                if (pos < s.length()) {
                    return true;
                }
                line++;
                pos = 0;
            }
            return false;
        }

        private double number(String what, int index, int count) {
            String label = count > 1 ? what + " (value " + (index + 1) + " of " + count + ")" : what;
            if (!skipBlanks()) {
                throw error(text.size() - 1, label, "the file ends here (truncated)");
            }
            String s = text.get(line);
            Matcher m = NUMBER.matcher(s).region(pos, s.length());
            if (!m.lookingAt()) {
                int end = pos;
                while (end < s.length() && !Character.isWhitespace(s.charAt(end))) {
                    end++;
                }
                String token = s.substring(pos, end);
                String lower = token.toLowerCase(Locale.ROOT).replaceFirst("^[+-]", "");
                throw error(line, label, "'" + token + "' is not " + (lower.startsWith("nan") || lower.startsWith("inf")
                        ? "a finite number" : "a number"));
            }
            double v = Double.parseDouble(m.group().replace('d', 'e').replace('D', 'e'));
            if (!Double.isFinite(v)) {
                throw error(line, label, "'" + m.group() + "' is not a finite number");
            }
            pos = m.end();
            return v;
        }

        private double[] numbers(String what, int n) {
            double[] v = new double[n];
            for (int i = 0; i < n; i++) {
                v[i] = number(what, i, n);
            }
            return v;
        }

        private int count(String what, int max) {
            if (!skipBlanks()) {
                throw error(text.size() - 1, what, "missing: the file ends before the boundary and limiter counts");
            }
            String s = text.get(line);
            Matcher m = INTEGER.matcher(s).region(pos, s.length());
            boolean whole = m.lookingAt() && (m.end() == s.length() || Character.isWhitespace(s.charAt(m.end()))
                    || s.charAt(m.end()) == '-' || s.charAt(m.end()) == '+');
            if (!whole) {
                String found = s.substring(pos).trim();
                boolean number = NUMBER.matcher(s).region(pos, s.length()).lookingAt();
                throw error(line, what, "expected a whole number, got '" + (found.length() > 40 ? found.substring(0, 40) + "..." : found)
                        + "'" + (number ? "; more numbers than the grid sizes nw, nh on line 1 call for" : ""));
            }
            long v = Long.parseLong(m.group().replace("+", ""));
            if (v < 0) {
                throw error(line, what, "must not be negative, got " + v);
            }
            if (v > max) {
                throw error(line, what, "must be at most " + max + ", got " + v);
            }
            pos = m.end();
            return (int) v;
        }

        private void mark(GeqdskData.Block b) {
            skipBlanks();
            lines[b.ordinal()] = Math.min(line, Math.max(0, text.size() - 1)) + 1;
        }

        GeqdskData read() {
            if (text.isEmpty()) {
                throw new FieldParameterException(where + ": line 1: header: the file is empty");
            }
            String head = text.get(0);
            lines[GeqdskData.Block.HEADER.ordinal()] = 1;
            String description = head.substring(0, Math.min(48, head.length())).trim();
            String[] tokens = head.substring(Math.min(48, head.length())).trim().split("\\s+");
            if (tokens.length < 3 || tokens[0].isEmpty()) {
                tokens = head.trim().split("\\s+");
            }
            if (tokens.length < 3) {
                throw error(0, "header", "expected three whole numbers (code, nw, nh) after 48 characters of text");
            }
            int nw = headerSize(tokens[tokens.length - 2], "nw");
            int nh = headerSize(tokens[tokens.length - 1], "nh");
            line = 1;
            pos = 0;
            mark(GeqdskData.Block.SCALARS);
            String[] names = {"rdim", "zdim", "rcentr", "rleft", "zmid", "rmaxis", "zmaxis", "simag", "sibry", "bcentr",
                "current", "simag (repeated)", "xdum", "rmaxis (repeated)", "xdum", "zmaxis (repeated)", "xdum",
                "sibry (repeated)", "xdum", "xdum"};
            double[] sc = new double[20];
            int[] scLine = new int[20];
            for (int i = 0; i < 20; i++) {
                sc[i] = number(names[i], 0, 1);
                scLine[i] = line;
            }
            if (!(sc[0] > 0)) {
                throw error(scLine[0], "rdim", "the grid's width must be > 0 m, got " + sc[0]);
            }
            if (!(sc[1] > 0)) {
                throw error(scLine[1], "zdim", "the grid's height must be > 0 m, got " + sc[1]);
            }
            if (!(sc[3] > 0)) {
                throw error(scLine[3], "rleft", "the grid must lie at R > 0 m, got " + sc[3]);
            }
            if (sc[7] == sc[8]) {
                throw error(scLine[8], "sibry", "equals simag = " + sc[7] + ": the flux is flat, no surfaces to nest");
            }
            mark(GeqdskData.Block.FPOL);
            double[] fpol = numbers("fpol", nw);
            mark(GeqdskData.Block.PRES);
            double[] pres = numbers("pres", nw);
            mark(GeqdskData.Block.FFPRIM);
            double[] ffprim = numbers("ffprim", nw);
            mark(GeqdskData.Block.PPRIME);
            double[] pprime = numbers("pprime", nw);
            mark(GeqdskData.Block.PSIRZ);
            double[][] psirz = new double[nh][];
            for (int j = 0; j < nh; j++) {
                psirz[j] = new double[nw];
                for (int i = 0; i < nw; i++) {
                    psirz[j][i] = number("psirz", j * nw + i, nw * nh);
                }
            }
            mark(GeqdskData.Block.QPSI);
            double[] qpsi = numbers("qpsi", nw);
            mark(GeqdskData.Block.COUNTS);
            int nb = count("nbbbs (boundary points)", 1_000_000);
            int nl = count("limitr (limiter points)", 1_000_000);
            mark(GeqdskData.Block.BOUNDARY);
            double[] rb = new double[nb];
            double[] zb = new double[nb];
            for (int k = 0; k < nb; k++) {
                rb[k] = number("rbbbs", k, nb);
                zb[k] = number("zbbbs", k, nb);
            }
            mark(GeqdskData.Block.LIMITER);
            double[] rl = new double[nl];
            double[] zl = new double[nl];
            for (int k = 0; k < nl; k++) {
                rl[k] = number("rlim", k, nl);
                zl[k] = number("zlim", k, nl);
            }
            return new GeqdskData(description, nw, nh, sc[0], sc[1], sc[2], sc[3], sc[4], sc[5], sc[6], sc[7], sc[8],
                    sc[9], sc[10], fpol, pres, ffprim, pprime, psirz, qpsi, rb, zb, rl, zl, lines);
        }

        private int headerSize(String token, String name) {
            if (!INTEGER.matcher(token).matches()) {
                throw error(0, name, "expected a whole number at the end of the first line, got '" + token + "'");
            }
            long v = Long.parseLong(token.replace("+", ""));
            if (v < 4 || v > MAX_NODES) {
                throw error(0, name, "the grid needs 4 to " + MAX_NODES + " nodes per direction, got " + v);
            }
            return (int) v;
        }
    }

    /**
     * Samples an equilibrium into the contents of a file, in the COCOS given (see {@link Cocos}):
     * ψ on the grid, the profiles on nw levels from the axis to the boundary (q by
     * {@link FluxSurfaces#safetyFactor}, the current by {@link FluxSurfaces#plasmaCurrent}), the
     * boundary as 129 points of ψ_N = 1 and the limiter {@code wallGap} outside it.
     *
     * @param eq       the equilibrium (twinorbit's convention, COCOS 3 per radian)
     * @param rMin     the grid's inner edge (m)
     * @param rMax     the grid's outer edge (m)
     * @param zMin     the grid's bottom (m)
     * @param zMax     the grid's top (m)
     * @param nw       nodes in R
     * @param nh       nodes in Z
     * @param wallGap  the limiter's distance outside the boundary along rays from the axis (m)
     * @param rcentr   the reference major radius (m)
     * @param cocos    the convention to write in
     */
    public static GeqdskData sample(AxisymmetricEquilibrium eq, String description, double rMin, double rMax,
                                    double zMin, double zMax, int nw, int nh, double wallGap, double rcentr, Cocos cocos) {
        FluxSurfaces surfaces = new FluxSurfaces(eq, 0.01 * (rMax - rMin));
        double psiFile = 1 / cocos.psiFactor();
        double tor = cocos.toroidalSign();
        double psiA = eq.psiAxis();
        double psiB = eq.psiBoundary();
        double[] fpol = new double[nw];
        double[] pres = new double[nw];
        double[] ffprim = new double[nw];
        double[] pprime = new double[nw];
        double[] qpsi = new double[nw];
        for (int k = 0; k < nw; k++) {
            double level = (double) k / (nw - 1);
            double psi = psiA + level * (psiB - psiA);
            double f = eq.f(psi);
            fpol[k] = tor * f;
            pres[k] = eq.pressure(psi);
            ffprim[k] = f * eq.fPrime(psi) * cocos.psiFactor();
            pprime[k] = eq.pressurePrime(psi) * cocos.psiFactor();
            // on the axis itself the surface is a point: q there is the limit, taken a hair away
            qpsi[k] = cocos.sigmaRhoThetaPhi() * surfaces.safetyFactor(Math.max(level, 1e-7), 128);
        }
        double[] axis = eq.axis();
        double[][] psirz = new double[nh][nw];
        double[] p = new double[6];
        for (int j = 0; j < nh; j++) {
            for (int i = 0; i < nw; i++) {
                eq.psi(rMin + (rMax - rMin) * i / (nw - 1), zMin + (zMax - zMin) * j / (nh - 1), p);
                psirz[j][i] = p[0] * psiFile;
            }
        }
        int nb = 129;
        double[] rb = new double[nb];
        double[] zb = new double[nb];
        double[] rl = new double[nb];
        double[] zl = new double[nb];
        for (int k = 0; k < nb; k++) {
            double th = 2 * Math.PI * k / (nb - 1);
            double rho = surfaces.radius(th, 1.0);
            rb[k] = axis[0] + rho * Math.cos(th);
            zb[k] = axis[1] + rho * Math.sin(th);
            rl[k] = axis[0] + (rho + wallGap) * Math.cos(th);
            zl[k] = axis[1] + (rho + wallGap) * Math.sin(th);
        }
        double current = tor * surfaces.plasmaCurrent(128);
        double bcentr = tor * eq.f(psiB) / rcentr;
        return new GeqdskData(description, nw, nh, rMax - rMin, zMax - zMin, rcentr, rMin, 0.5 * (zMin + zMax),
                axis[0], axis[1], psiA * psiFile, psiB * psiFile, bcentr, current, fpol, pres, ffprim, pprime, psirz,
                qpsi, rb, zb, rl, zl, new int[GeqdskData.Block.values().length]);
    }

    /** A field straight from contents (no file: the numbers keep every digit), in the contents' COCOS. */
    public static GeqdskField field(GeqdskData d, int cocos) {
        return new GeqdskField(PREFIX + "(in memory)", d, Cocos.of(cocos), "in-memory G-EQDSK");
    }

    /** Writes an equilibrium sampled by {@link #sample} as a file (atomically: a temporary file, then a move). */
    public static void write(AxisymmetricEquilibrium eq, String description, double rMin, double rMax, double zMin,
                             double zMax, int nw, int nh, double wallGap, double rcentr, Cocos cocos, Path file) {
        write(sample(eq, description, rMin, rMax, zMin, zMax, nw, nh, wallGap, rcentr, cocos), file);
    }

    /** Writes contents in the format: 48 + 3 × 4 characters, then five numbers of 16 characters a line. */
    public static void write(GeqdskData d, Path file) {
        StringBuilder out = new StringBuilder();
        String head = d.description().length() > 48 ? d.description().substring(0, 48) : d.description();
        out.append(String.format(Locale.ROOT, "%-48s%4d%4d%4d%n", head, 0, d.nw(), d.nh()));
        Block block = new Block(out);
        block.add(new double[] {d.rdim(), d.zdim(), d.rcentr(), d.rleft(), d.zmid(),
            d.rmaxis(), d.zmaxis(), d.simag(), d.sibry(), d.bcentr(),
            d.current(), d.simag(), 0, d.rmaxis(), 0,
            d.zmaxis(), 0, d.sibry(), 0, 0});
        block.add(d.fpol());
        block.add(d.pres());
        block.add(d.ffprim());
        block.add(d.pprime());
        double[] grid = new double[d.nw() * d.nh()];
        for (int j = 0; j < d.nh(); j++) {
            System.arraycopy(d.psirz()[j], 0, grid, j * d.nw(), d.nw());
        }
        block.add(grid);
        block.add(d.qpsi());
        out.append(String.format(Locale.ROOT, "%5d%5d%n", d.rbbbs().length, d.rlim().length));
        block.add(pairs(d.rbbbs(), d.zbbbs()));
        block.add(pairs(d.rlim(), d.zlim()));
        try {
            Path tmp = file.resolveSibling(file.getFileName() + ".tmp");
            Files.writeString(tmp, out.toString(), StandardCharsets.US_ASCII);
            Files.move(tmp, file, java.nio.file.StandardCopyOption.REPLACE_EXISTING,
                    java.nio.file.StandardCopyOption.ATOMIC_MOVE);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    private static double[] pairs(double[] r, double[] z) {
        double[] v = new double[2 * r.length];
        for (int k = 0; k < r.length; k++) {
            v[2 * k] = r[k];
            v[2 * k + 1] = z[k];
        }
        return v;
    }

    /** Numbers five to a line, 16 characters each; every block starts on a new line. */
    private static final class Block {
        private final StringBuilder out;

        Block(StringBuilder out) {
            this.out = out;
        }

        void add(double[] v) {
            for (int i = 0; i < v.length; i++) {
                out.append(String.format(Locale.ROOT, "%16.9E", v[i] + 0.0));
                if (i % 5 == 4 || i == v.length - 1) {
                    out.append('\n');
                }
            }
        }
    }
}
