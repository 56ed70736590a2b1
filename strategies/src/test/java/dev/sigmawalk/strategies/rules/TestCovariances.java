package dev.sigmawalk.strategies.rules;

import dev.sigmawalk.engine.model.CovarianceEstimate;
import dev.sigmawalk.engine.model.DenseProof;
import dev.sigmawalk.strategies.optimize.SingleFactorForm;
import dev.sigmawalk.strategies.optimize.SingleFactorMinVariance;
import java.util.ArrayList;
import java.util.List;

/** Covariance estimates for tests: a dense matrix, and a single-factor form that also offers the dense view. */
final class TestCovariances {
    private TestCovariances() {
    }

    static CovarianceEstimate dense(double[] sigma) {
        return dense(sigma, DenseProof.UNPROVEN);
    }

    /** A dense matrix whose producer claims the given proof (the test's word). */
    static CovarianceEstimate dense(double[] sigma, DenseProof proof) {
        int n = (int) Math.round(Math.sqrt(sigma.length));
        return new CovarianceEstimate() {
            @Override
            public int size() {
                return n;
            }

            @Override
            public double get(int i, int j) {
                return sigma[i * n + j];
            }

            @Override
            public double[] dense() {
                return sigma;
            }

            @Override
            public DenseProof proof() {
                return proof;
            }
        };
    }

    /** A class implementing both interfaces, as the single-index model does. */
    static final class FactorCovariance implements CovarianceEstimate, SingleFactorForm {
        private final SingleFactorForm form;
        private final double[] dense;

        FactorCovariance(SingleFactorForm form) {
            this.form = form;
            this.dense = SingleFactorMinVariance.dense(form);
        }

        @Override
        public int size() {
            return form.loadings().length;
        }

        @Override
        public double get(int i, int j) {
            return dense[i * size() + j];
        }

        @Override
        public double[] dense() {
            return dense;
        }

        @Override
        public double factorVariance() {
            return form.factorVariance();
        }

        @Override
        public double[] loadings() {
            return form.loadings();
        }

        @Override
        public double[] specificVariances() {
            return form.specificVariances();
        }
    }

    /** Asset ids "X00", "X01", ... */
    static List<String> names(int n) {
        List<String> names = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            names.add(String.format("X%02d", i));
        }
        return names;
    }
}
