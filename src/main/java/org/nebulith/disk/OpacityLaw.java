package org.nebulith.disk;

/** A Rosseland-mean opacity law of the disk gas-dust mixture [cm^2 per gram of gas]. */
public interface OpacityLaw {
    /**
     * @param tK midplane temperature [K]
     * @return opacity [cm^2 g^-1], finite and &gt; 0
     */
    double kappaCm2PerG(double tK);

    /** @return the exponent b of kappa ~ T^b (used to check that the disk solution is unique) */
    double temperatureExponent();

    /** @return one line for reports */
    String description();
}
