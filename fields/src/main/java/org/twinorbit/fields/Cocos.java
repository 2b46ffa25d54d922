package org.twinorbit.fields;

/**
 * A COCOS sign convention for equilibrium files (Sauter &amp; Medvedev, Comput. Phys. Commun. 184,
 * 293, 2013, Table 1; from memory): B = F ∇φ + σ_Bp ∇φ × ∇ψ / (2π)^e_Bp, with (R, φ, Z)
 * right-handed when σ_RφZ = +1 and (R, Z, φ) right-handed when σ_RφZ = −1; ψ is the flux per
 * radian when e_Bp = 0 and the total flux when e_Bp = 1 (indices 11–18). σ_ρθφ sets only the sign
 * of q.
 *
 * <p>Inside twinorbit B = ∇ψ × ∇φ + F ∇φ in right-handed (R, φ, Z), ψ per radian: COCOS 3. A file
 * quantity converts as ψ = s ψ_file / (2π)^e_Bp with s = −σ_RφZ σ_Bp, and F = σ_RφZ F_file.
 *
 * @param index          1–8 or 11–18
 * @param sigmaBp        σ_Bp
 * @param sigmaRPhiZ     σ_RφZ
 * @param sigmaRhoThetaPhi σ_ρθφ
 * @param twoPiPower     e_Bp
 */
public record Cocos(int index, int sigmaBp, int sigmaRPhiZ, int sigmaRhoThetaPhi, int twoPiPower) {

    /**
     * The convention a G-EQDSK file is read and written in unless the user names another: COCOS 1,
     * the one most G-EQDSK files are written in (from memory; not a property of the format). A file
     * whose signs of ψ and current contradict the σ_Bp of the chosen index is refused, naming the
     * indices that fit; σ_RφZ and e_Bp cannot be told from a file's signs and stay the user's call.
     */
    public static final int DEFAULT = 1;

    /** @throws FieldParameterException for an index that is not a COCOS */
    public static Cocos of(int index) {
        int base = index > 10 ? index - 10 : index;
        if (base < 1 || base > 8) {
            throw new FieldParameterException("cocos must be one of 1-8 or 11-18 (Sauter & Medvedev 2013), got " + index);
        }
        int[][] signs = {{1, 1, 1}, {1, -1, 1}, {-1, 1, -1}, {-1, -1, -1}, {1, 1, -1}, {1, -1, -1}, {-1, 1, 1}, {-1, -1, 1}};
        int[] s = signs[base - 1];
        return new Cocos(index, s[0], s[1], s[2], index > 10 ? 1 : 0);
    }

    /** ψ (T m²) of twinorbit's convention per unit of the file's ψ. */
    public double psiFactor() {
        return -sigmaRPhiZ * sigmaBp / Math.pow(2 * Math.PI, twoPiPower);
    }

    /** F of twinorbit's convention per unit of the file's F (also for the toroidal current and field). */
    public double toroidalSign() {
        return sigmaRPhiZ;
    }
}
