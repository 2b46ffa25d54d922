package org.twinorbit.fields;

import java.util.Arrays;
import java.util.List;

/**
 * What the three gridded fields ({@link GridField}, {@link CylindricalGridField},
 * {@link AxisymmetricGridField}) share: their name and length, the energy invariant, Φ taken as
 * zero without a potential table, no vector potential, and the divergence check computed once.
 * Each subclass keeps its own table and evaluation; {@link AnnulusGridField} adds the R–Z domain
 * of the two curvilinear grids. The domain is the grid's own (box or annulus), cut by an optional
 * wall polygon in (R, Z) with R = √(x² + y²): the margin is the smaller of the two, so a particle
 * leaving the grid or crossing the wall is lost.
 */
abstract class GriddedFieldBase implements GriddedField {

    private final String name;
    private final double length;
    private final String meaning;
    private final List<Invariant> invariants;
    private volatile Double divergence;
    /** The wall in (R, Z), or null; set once by {@link GridFile#read} before the field is handed out. */
    private WallPolygon wall;
    /** Whether the nodes carry Φ as a fourth table component after B's three. */
    protected final boolean electric;

    /**
     * @param name     the field's name in reports
     * @param length   the field's length L (m) that defines ε
     * @param meaning  what L means, for reports
     * @param electric whether a potential Φ is given on the nodes
     */
    GriddedFieldBase(String name, double length, String meaning, boolean electric) {
        this.name = name;
        this.length = length;
        this.meaning = meaning;
        this.electric = electric;
        this.invariants = List.of(Invariants.energy(this));
    }

    /** The interpolated Φ (V) at a Cartesian point (m); called only when {@link #electric}. */
    abstract double interpolatedPotential(double x, double y, double z);

    /** The grid's largest extent (m), the divergence check's length when L is infinite. */
    abstract double extent();

    /** The distance (m) of a Cartesian point (m) inside the grid's own box or annulus, negative outside. */
    abstract double gridMargin(double x, double y, double z);

    /** The grid's own box or annulus, in words. */
    abstract String gridMeaning();

    /** Cuts the domain by a wall polygon in (R, Z) (m); called once, before the field is used. */
    final void setWall(WallPolygon w) {
        this.wall = w;
    }

    /** The wall in (R, Z), or null without one. */
    public final WallPolygon wall() {
        return wall;
    }

    /** The grid's margin, or with a wall the smaller of it and the wall's signed distance (m). */
    @Override
    public final double domainMargin(double x, double y, double z) {
        double m = gridMargin(x, y, z);
        return wall == null ? m : Math.min(m, wall.signedDistance(Math.sqrt(x * x + y * y), z));
    }

    @Override
    public final String domainMeaning() {
        return wall == null ? gridMeaning() + "; a particle leaving it is lost"
                : gridMeaning() + " and inside the wall polygon of " + wall.size() + " corners in (R, Z) from the grid "
                + "file; a particle leaving the grid or crossing the wall is lost";
    }

    @Override public String name() { return name; }

    /** The interpolated Φ (V); 0 without one. */
    @Override
    public double potential(double t, double x, double y, double z) {
        return electric ? interpolatedPotential(x, y, z) : 0;
    }

    /** E, when there is one, is −∇Φ of the interpolated Φ. */
    @Override public boolean hasPotential() { return true; }

    /** Not known for a field given only as B on a grid: NaN (no canonical invariant uses it). */
    @Override
    public void vectorPotential(double t, double x, double y, double z, double[] out) {
        Arrays.fill(out, Double.NaN);
    }

    @Override public double length() { return length; }
    @Override public String lengthMeaning() { return meaning; }
    @Override public boolean hasElectricField() { return electric; }
    @Override public List<Invariant> invariants() { return invariants; }

    @Override
    public double maxDivergence() {
        if (divergence == null) {
            divergence = GriddedField.divergenceOver(this, extent());
        }
        return divergence;
    }

    /** The spacing (m or rad) of uniform nodes. */
    static double step(double[] a) {
        return (a[a.length - 1] - a[0]) / (a.length - 1);
    }
}
