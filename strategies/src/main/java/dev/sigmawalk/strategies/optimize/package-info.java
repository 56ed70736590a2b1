/**
 * Exact solvers for the budget-constrained quadratic programs behind the portfolio rules.
 *
 * <ul>
 *   <li>{@link dev.sigmawalk.strategies.optimize.ActiveSetSolver}: minimise ½ w'Qw − c'w s.t.
 *       Σ w = 1, lower ≤ w ≤ upper, by a primal active-set method with an updatable Cholesky
 *       factor, warm-startable from a previous {@link dev.sigmawalk.strategies.optimize.BoundSide}
 *       partition.</li>
 *   <li>{@link dev.sigmawalk.strategies.optimize.UnboundedSolver}: the closed forms without bounds.</li>
 *   <li>{@link dev.sigmawalk.strategies.optimize.SingleFactorMinVariance}: minimum variance for
 *       Σ = s ββ' + diag(d) ({@link dev.sigmawalk.strategies.optimize.SingleFactorForm}) in O(n)
 *       without bounds and by a clamp-and-threshold rule with bounds.</li>
 *   <li>{@link dev.sigmawalk.strategies.optimize.MaxSharpeSolver}: the maximum Sharpe ratio.</li>
 * </ul>
 * Every answer handed out as {@link dev.sigmawalk.strategies.optimize.SolveOutcome.Optimal} has
 * passed {@link dev.sigmawalk.strategies.optimize.KktCheck}; everything else is
 * {@link dev.sigmawalk.strategies.optimize.SolveOutcome.Infeasible} or
 * {@link dev.sigmawalk.strategies.optimize.SolveOutcome.Failed} with a reason, never NaN weights.
 */
package dev.sigmawalk.strategies.optimize;
