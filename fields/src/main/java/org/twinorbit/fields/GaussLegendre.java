package org.twinorbit.fields;

import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;

/** The 48-point Gauss–Legendre rule on [−1, 1] (Commons Math), computed once. */
final class GaussLegendre {

    static final double[] NODES;
    static final double[] WEIGHTS;

    static {
        GaussIntegrator rule = new GaussIntegratorFactory().legendreHighPrecision(48);
        NODES = new double[rule.getNumberOfPoints()];
        WEIGHTS = new double[NODES.length];
        for (int i = 0; i < NODES.length; i++) {
            NODES[i] = rule.getPoint(i);
            WEIGHTS[i] = rule.getWeight(i);
        }
    }

    private GaussLegendre() {}
}
