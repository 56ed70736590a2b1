/**
 * The portfolio rules a study can name (min-variance, mean-variance, max-Sharpe, equal-weight),
 * each turning a {@link dev.sigmawalk.strategies.rules.RuleInput} into a
 * {@link dev.sigmawalk.strategies.rules.RuleOutcome}: weights with their forecast variance w'Σw
 * and notes, or the reason no portfolio could be formed. One
 * {@link dev.sigmawalk.strategies.rules.WarmStart} per (strategy, window) path carries the
 * previous active set between rebalances.
 */
package dev.sigmawalk.strategies.rules;
