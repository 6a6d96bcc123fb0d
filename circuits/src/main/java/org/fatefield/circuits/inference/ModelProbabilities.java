package org.fatefield.circuits.inference;

/**
 * Posterior model probabilities from evidence estimates under equal prior model probabilities,
 * p_m = Z_m / sum_j Z_j, with Monte Carlo standard errors by the delta method from the
 * evidences' independent standard errors (the evidence of each model comes from its own
 * proposals). The ratio Z_1 / Z_2 at tolerance zero on a statistic S is the Bayes factor given S
 * (Grelaud, Robert, Marin, Rodolphe &amp; Taly 2009, ABC likelihood-free methods for model choice
 * in Gibbs random fields, Bayesian Analysis 4:317; Didelot, Everitt, Johansen &amp; Lawson 2011,
 * Likelihood-free estimation of model evidence, Bayesian Analysis 6:49).
 *
 * @param probabilities posterior probability of each model (NaN if no model has any evidence)
 * @param errors        standard error of each
 */
public record ModelProbabilities(double[] probabilities, double[] errors) {

    /** From evidence estimates and their standard errors. */
    public static ModelProbabilities of(double[] evidence, double[] evidenceSe) {
        int n = evidence.length;
        double total = 0;
        for (double z : evidence) {
            total += z;
        }
        double[] p = new double[n];
        double[] se = new double[n];
        for (int m = 0; m < n; m++) {
            if (!(total > 0)) {
                p[m] = Double.NaN;
                se[m] = Double.NaN;
                continue;
            }
            p[m] = evidence[m] / total;
            double variance = 0;
            for (int j = 0; j < n; j++) {
                double derivative = j == m ? (total - evidence[m]) / (total * total) : -evidence[m] / (total * total);
                variance += derivative * derivative * evidenceSe[j] * evidenceSe[j];
            }
            se[m] = Math.sqrt(variance);
        }
        return new ModelProbabilities(p, se);
    }
}
