package org.twinorbit.fields;

/**
 * The contents of a G-EQDSK file, in the file's own units and sign convention (SI: m, T, T m or
 * Wb/rad, Pa, A). Profiles are on nw points uniform in ψ from simag to sibry; psirz is [iZ][iR].
 *
 * @param description the first 48 characters of the first line
 * @param lines       the line (1-based) where each block starts, for messages: see {@link Block}
 */
public record GeqdskData(String description, int nw, int nh,
                         double rdim, double zdim, double rcentr, double rleft, double zmid,
                         double rmaxis, double zmaxis, double simag, double sibry, double bcentr, double current,
                         double[] fpol, double[] pres, double[] ffprim, double[] pprime, double[][] psirz,
                         double[] qpsi, double[] rbbbs, double[] zbbbs, double[] rlim, double[] zlim,
                         int[] lines) {

    /** The blocks of the file in order, named as the format names them. */
    public enum Block { HEADER, SCALARS, FPOL, PRES, FFPRIM, PPRIME, PSIRZ, QPSI, COUNTS, BOUNDARY, LIMITER }

    /** The line where a block starts (1-based). */
    public int line(Block b) {
        return lines[b.ordinal()];
    }

    /** The grid's R of column i (m). */
    public double r(int i) {
        return rleft + rdim * i / (nw - 1);
    }

    /** The grid's Z of row j (m). */
    public double z(int j) {
        return zmid - zdim / 2 + zdim * j / (nh - 1);
    }
}
