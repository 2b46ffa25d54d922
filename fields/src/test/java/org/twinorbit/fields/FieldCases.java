package org.twinorbit.fields;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.stream.Stream;
import org.twinorbit.shared.Species;

/**
 * Every library field with its default parameters, a set of test points inside its domain (random,
 * with a fixed seed, plus points chosen close to the domain edges and to special places such as
 * the magnetic axis) and the local length scale over which the field varies at a point, which
 * sets the finite-difference step and the size of the error.
 */
final class FieldCases {

    /** Species every case is built for (ramp and wave need one). */
    static final Species SPECIES = Species.PROTON;

    /** One field under test. */
    record Case(String name, Field field, List<double[]> points, LocalScale scale) {
        @Override public String toString() { return name; }
    }

    /** The length (m) over which the field changes at a point (t, x, y, z). */
    @FunctionalInterface
    interface LocalScale {
        double at(double[] p);
    }

    private FieldCases() {}

    static Stream<Case> all() {
        return Stream.of(uniform(), crossed(), gradient(), toroidal(), mirror(), dipole(), tokamak(), solovev(),
                currentSheet(), shear(), ramp(), wave());
    }

    static Case byName(String name) {
        return all().filter(c -> c.name.equals(name)).findFirst().orElseThrow();
    }

    private static Field make(String name) {
        return Fields.create(name, Map.of(), SPECIES);
    }

    /** n points (t, x, y, z) uniformly in a box, time 0. */
    private static List<double[]> box(long seed, int n, double[] lo, double[] hi) {
        Random r = new Random(seed);
        List<double[]> pts = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            pts.add(new double[] {0, lo[0] + (hi[0] - lo[0]) * r.nextDouble(),
                    lo[1] + (hi[1] - lo[1]) * r.nextDouble(), lo[2] + (hi[2] - lo[2]) * r.nextDouble()});
        }
        return pts;
    }

    private static Case uniform() {
        List<double[]> p = box(1, 20, new double[] {-1, -1, -1}, new double[] {1, 1, 1});
        return new Case("uniform", make("uniform"), p, q -> 1.0);
    }

    private static Case crossed() {
        List<double[]> p = box(2, 20, new double[] {-1, -1, -1}, new double[] {1, 1, 1});
        return new Case("crossed", make("crossed"), p, q -> 1.0);
    }

    private static Case gradient() {
        List<double[]> p = box(3, 40, new double[] {-0.9, -2, -2}, new double[] {3, 2, 2});
        p.add(new double[] {0, -0.999, 0.3, -0.2});   // close to the edge x = -Lg
        p.add(new double[] {0, -0.99999, 0, 0});
        // Near the edge the stencil (±2h) must stay inside the domain, so h shrinks with the
        // distance to it; but not below ~1e-6 m, where the rounding of x itself (1e-16 m) over h
        // would dominate the difference.
        return new Case("gradient", make("gradient"), p, q -> Math.min(1.0, 100 * (q[1] + 1.0)));
    }

    private static Case toroidal() {
        Random r = new Random(4);
        List<double[]> p = new ArrayList<>();
        for (int i = 0; i < 40; i++) {
            double rr = 0.05 + 2.95 * r.nextDouble();
            double phi = 2 * Math.PI * r.nextDouble();
            p.add(new double[] {0, rr * Math.cos(phi), rr * Math.sin(phi), -1 + 2 * r.nextDouble()});
        }
        p.add(new double[] {0, 0.002, 0.0005, 0.1});  // near the edge R = 0.001 R0
        p.add(new double[] {0, -0.0011, 0.0003, 0});
        return new Case("toroidal", make("toroidal"), p, q -> Math.hypot(q[1], q[2]));
    }

    private static Case mirror() {
        List<double[]> p = box(5, 40, new double[] {-0.5, -0.5, -0.99}, new double[] {0.5, 0.5, 0.99});
        p.add(new double[] {0, 0.1, -0.05, 0.9999});  // at the throats
        p.add(new double[] {0, 0.2, 0.1, -0.9999});
        p.add(new double[] {0, 0, 0, 0});
        return new Case("mirror", make("mirror"), p, q -> 1.0);
    }

    private static Case dipole() {
        Random r = new Random(6);
        double rp = 6.4e6;
        List<double[]> p = new ArrayList<>();
        for (int i = 0; i < 40; i++) {
            double rad = rp * (1.0 + 9.0 * r.nextDouble());
            double cz = -1 + 2 * r.nextDouble();
            double sz = Math.sqrt(1 - cz * cz);
            double phi = 2 * Math.PI * r.nextDouble();
            p.add(new double[] {0, rad * sz * Math.cos(phi), rad * sz * Math.sin(phi), rad * cz});
        }
        p.add(new double[] {0, 1.001 * rp, 0, 0});      // just above the surface, equator
        p.add(new double[] {0, 0, 0, 1.001 * rp});      // and over the pole
        p.add(new double[] {0, 4 * rp, 0, 0});
        return new Case("dipole", make("dipole"), p,
                q -> Math.sqrt(q[1] * q[1] + q[2] * q[2] + q[3] * q[3]));
    }

    private static Case tokamak() {
        Random r = new Random(7);
        double r0 = 1.5;
        double a = 0.5;
        List<double[]> p = new ArrayList<>();
        for (int i = 0; i < 40; i++) {
            double rm = a * Math.sqrt(r.nextDouble());
            double th = 2 * Math.PI * r.nextDouble();
            double phi = 2 * Math.PI * r.nextDouble();
            double big = r0 + rm * Math.cos(th);
            p.add(new double[] {0, big * Math.cos(phi), big * Math.sin(phi), rm * Math.sin(th)});
        }
        p.add(new double[] {0, r0, 0, 0});                    // on the magnetic axis
        p.add(new double[] {0, 0, r0 + 1e-6, 1e-6});           // next to it
        p.add(new double[] {0, r0 + 0.999 * a, 0, 0});         // at the wall, outboard
        p.add(new double[] {0, -(r0 - 0.999 * a), 0, 0});      // inboard
        p.add(new double[] {0, 0, r0, 0.999 * a});             // top
        return new Case("tokamak", make("tokamak"), p, q -> a);
    }

    private static Case currentSheet() {
        double d = 6.4e6;
        List<double[]> p = box(8, 40, new double[] {-10 * d, -10 * d, -5 * d}, new double[] {10 * d, 10 * d, 5 * d});
        p.add(new double[] {0, 0, 0, 0});
        p.add(new double[] {0, 3 * d, 0, 1e-3 * d});
        p.add(new double[] {0, 0, 0, 25 * d});     // deep in the lobe: sech² ~ 1e-21
        // B varies over δ, but its direction turns over R_c = δ Bn/B0 = δ/10 at the centre
        return new Case("current-sheet", make("current-sheet"), p, q -> d * 2e-9 / 20e-9);
    }

    private static Case shear() {
        List<double[]> p = box(9, 40, new double[] {-5, -5, -5}, new double[] {5, 5, 5});
        return new Case("shear", make("shear"), p, q -> 1.0);
    }

    /** Inside the last closed surface (random, kept where the margin is positive), near the axis and the edge. */
    private static Case solovev() {
        SolovevField f = (SolovevField) make("solovev");
        Random r = new Random(14);
        List<double[]> p = new ArrayList<>();
        while (p.size() < 40) {
            double rr = 1.7 - 0.55 + 1.1 * r.nextDouble();
            double z = -0.9 + 1.8 * r.nextDouble();
            if (f.domainMargin(rr, 0, z) > 0) {
                double phi = 2 * Math.PI * r.nextDouble();
                p.add(new double[] {0, rr * Math.cos(phi), rr * Math.sin(phi), z});
            }
        }
        double[] axis = f.axis();
        p.add(new double[] {0, axis[0] + 1e-4, 0, 1e-4});   // by the magnetic axis
        p.add(new double[] {0, 0, 1.7 + 0.499, 0});         // by the outer edge, φ = 90°
        p.add(new double[] {0, 1.7 - 0.33 * 0.5, 0, 0.99 * 1.7 * 0.5}); // under the top point
        return new Case("solovev", f, p, q -> 0.5);
    }

    private static Case ramp() {
        RampField f = (RampField) make("ramp");
        List<double[]> p = box(10, 20, new double[] {-1, -1, -1}, new double[] {1, 1, 1});
        Random r = new Random(11);
        for (double[] q : p) {
            q[0] = f.timeScale() * 3 * r.nextDouble();
        }
        return new Case("ramp", f, p, q -> 1.0);
    }

    private static Case wave() {
        Field f = make("wave");
        List<double[]> p = box(12, 20, new double[] {-1, -1, -1}, new double[] {1, 1, 1});
        Random r = new Random(13);
        for (double[] q : p) {
            q[0] = f.timeScale() * 10 * r.nextDouble();
        }
        return new Case("wave", f, p, q -> 1.0);
    }
}
