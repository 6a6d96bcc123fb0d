package org.fatefield.circuits.inference;

import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;

/**
 * The prior of one parameter. The sampler works in a working space where the prior is uniform or
 * normal: the value itself for uniform and normal priors, its natural logarithm for a log-uniform
 * prior. Perturbation, prior density and kernel density are all taken in that space, so the
 * importance weights are consistent.
 */
public sealed interface Prior permits Prior.Uniform, Prior.LogUniform, Prior.Normal {

    /** The working-space coordinate of the value {@code theta}. */
    double toWorking(double theta);

    /** The value at working-space coordinate {@code u}. */
    double fromWorking(double u);

    /** Log density in working space; negative infinity outside the support. */
    double logDensity(double u);

    /** A draw in working space. */
    double sample(UniformRandomProvider random);

    /** A short description, such as {@code uniform(0.5, 2)}. */
    String describe();

    /** Uniform on [low, high]. */
    record Uniform(double low, double high) implements Prior {
        /** Validates. */
        public Uniform {
            if (!(Double.isFinite(low) && Double.isFinite(high) && low < high)) {
                throw new IllegalArgumentException("a uniform prior needs finite low < high, got low = " + low
                        + ", high = " + high);
            }
        }

        @Override
        public double toWorking(double theta) {
            return theta;
        }

        @Override
        public double fromWorking(double u) {
            return u;
        }

        @Override
        public double logDensity(double u) {
            return u >= low && u <= high ? -Math.log(high - low) : Double.NEGATIVE_INFINITY;
        }

        @Override
        public double sample(UniformRandomProvider random) {
            return low + (high - low) * random.nextDouble();
        }

        @Override
        public String describe() {
            return "uniform(" + low + ", " + high + ")";
        }
    }

    /** Log-uniform on [low, high] with 0 &lt; low &lt; high: uniform in the logarithm. */
    record LogUniform(double low, double high) implements Prior {
        /** Validates. */
        public LogUniform {
            if (!(Double.isFinite(low) && Double.isFinite(high) && low > 0 && low < high)) {
                throw new IllegalArgumentException("a log-uniform prior needs 0 < low < high, both finite, got low = "
                        + low + ", high = " + high);
            }
        }

        @Override
        public double toWorking(double theta) {
            return Math.log(theta);
        }

        @Override
        public double fromWorking(double u) {
            return Math.exp(u);
        }

        @Override
        public double logDensity(double u) {
            double a = Math.log(low);
            double b = Math.log(high);
            return u >= a && u <= b ? -Math.log(b - a) : Double.NEGATIVE_INFINITY;
        }

        @Override
        public double sample(UniformRandomProvider random) {
            double a = Math.log(low);
            return a + (Math.log(high) - a) * random.nextDouble();
        }

        @Override
        public String describe() {
            return "log-uniform(" + low + ", " + high + ")";
        }
    }

    /** Normal with the given mean and standard deviation. */
    record Normal(double mean, double sd) implements Prior {
        /** Validates. */
        public Normal {
            if (!(Double.isFinite(mean) && Double.isFinite(sd) && sd > 0)) {
                throw new IllegalArgumentException("a normal prior needs a finite mean and sd > 0, got mean = " + mean
                        + ", sd = " + sd);
            }
        }

        @Override
        public double toWorking(double theta) {
            return theta;
        }

        @Override
        public double fromWorking(double u) {
            return u;
        }

        @Override
        public double logDensity(double u) {
            double z = (u - mean) / sd;
            return -0.5 * z * z - Math.log(sd) - 0.5 * Math.log(2 * Math.PI);
        }

        @Override
        public double sample(UniformRandomProvider random) {
            return mean + sd * ZigguratSampler.NormalizedGaussian.of(random).sample();
        }

        @Override
        public String describe() {
            return "normal(" + mean + ", " + sd + ")";
        }
    }
}
