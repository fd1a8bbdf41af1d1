package org.nebulith.zones;

import org.nebulith.disk.DiskState;

/**
 * A vector-valued quantity per gram of disk gas at radius r, e.g. the moles of each element in
 * condensed form per gram of gas at the local T and P (the caller's equilibrium results).
 * Implementations must be deterministic; they may be discontinuous at the break radii the caller
 * passes to {@link RadialIntegrator}.
 */
public interface RadialIntegrand {
    /** @return the number of components */
    int dimension();

    /**
     * @param state the disk's midplane state at r (r, T, P, Sigma)
     * @param out   receives {@link #dimension()} finite values [unit per gram of gas]
     */
    void evaluate(DiskState state, double[] out);
}
