package dev.sigmawalk.strategies.bench;

import dev.sigmawalk.engine.moments.CrossProducts;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.ojalgo.matrix.store.R064Store;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/**
 * The rank-k update of the running sums, C += U'V for row-major T×n blocks U and V, by the
 * project's kernel and by two general-purpose libraries. T = 42 is one move of 21 rows (21 added,
 * 21 removed), T = 1,000 a rebuild of a 1,000-row window; n = 2,001 is the large case's 2,000
 * assets and the market.
 *
 * <p>{@code crossProducts} updates the upper triangle only (n(n+1)/2 entries, what the running
 * sums need). {@code ejmlMultAddTransA} is EJML's C = C + A'B on its row-major matrix, which wraps
 * the same arrays without a copy and fills both triangles (twice the multiply-adds).
 * {@code ojalgoProduct} is ojAlgo's dense product into a preallocated store plus the addition into
 * C: ojAlgo stores column-major, so the row-major blocks wrap without a copy as V' and U' (n×T),
 * and V'U's column-major entries are C's row-major ones; it too fills both triangles, and ojAlgo
 * may split a large product over its own worker threads.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgsAppend = "-Xmx4g")
public class RankUpdateBenchmark {
    @Param({"42", "1000"})
    public int rows;

    @Param({"500", "2001"})
    public int n;

    private double[] u;
    private double[] v;
    private double[] c;
    private DMatrixRMaj ejmlU;
    private DMatrixRMaj ejmlV;
    private DMatrixRMaj ejmlC;
    private R064Store ojalgoUt;
    private R064Store ojalgoVt;
    private R064Store ojalgoProduct;

    @Setup
    public void setUp() {
        SplittableRandom rng = new SplittableRandom(5L);
        u = new double[rows * n];
        v = new double[rows * n];
        for (int k = 0; k < u.length; k++) {
            v[k] = 0.01 * rng.nextGaussian();
            u[k] = k < u.length / 2 ? v[k] : -v[k];
        }
        c = new double[n * n];
        ejmlU = DMatrixRMaj.wrap(rows, n, u);
        ejmlV = DMatrixRMaj.wrap(rows, n, v);
        ejmlC = DMatrixRMaj.wrap(n, n, c);
        ojalgoUt = R064Store.wrap(u, n);
        ojalgoVt = R064Store.wrap(v, n);
        ojalgoProduct = R064Store.FACTORY.make(n, n);
    }

    @Benchmark
    public double[] crossProducts() {
        CrossProducts.accumulate(u, v, rows, n, c);
        return c;
    }

    @Benchmark
    public DMatrixRMaj ejmlMultAddTransA() {
        CommonOps_DDRM.multAddTransA(ejmlU, ejmlV, ejmlC);
        return ejmlC;
    }

    @Benchmark
    public double[] ojalgoProduct() {
        ojalgoProduct.fillByMultiplying(ojalgoVt, ojalgoUt.transpose());
        double[] p = ojalgoProduct.data;
        for (int k = 0; k < c.length; k++) {
            c[k] += p[k];
        }
        return c;
    }
}
