package dev.skerry.compiler.solve.ojalgo;

import dev.skerry.compiler.solve.ProgressTicker;
import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.Method;
import org.ojalgo.function.multiary.MultiaryFunction;
import org.ojalgo.optimisation.ExpressionsBasedModel;
import org.ojalgo.optimisation.Optimisation;
import org.ojalgo.optimisation.integer.IntegerStrategy;
import org.ojalgo.optimisation.integer.ModelStrategy;
import org.ojalgo.optimisation.integer.NodeKey;
import org.ojalgo.structure.Access1D;

/**
 * ojAlgo's own branching strategy, unchanged, watched for progress: each new incumbent and the
 * root node's LP bound go to the {@link ProgressTicker}. ojAlgo 56 has no public progress API; the
 * strategy is the one place that sees new incumbents ({@code markInteger}) and solved nodes ({@code
 * onNodeSolved}). {@link ModelStrategy.AbstractStrategy} builds ojAlgo's default strategy as its
 * delegate, but its hooks are protected, which Java lets a subclass in another package call only
 * on itself: so the calls to the delegate go through reflection (a few per node, whose LP takes
 * far longer). If reflection fails, the search fails and the backend reports the error.
 *
 * <p>Values are in ojAlgo's terms, the objective without its constant, which is added here. The
 * bound is the root LP's objective (the best of its re-solves after cuts): valid, but not ojAlgo's
 * open-node bound, which it keeps to itself.
 */
final class ProgressStrategy extends ModelStrategy.AbstractStrategy {
  private static final Method INITIALISE =
      hook("initialise", MultiaryFunction.TwiceDifferentiable.class, Access1D.class);
  private static final Method CUT_OR_BRANCH =
      hook(
          "isCutRatherThanBranch",
          NodeKey.class,
          int.class,
          double.class,
          double.class,
          Optimisation.Result.class);
  private static final Method MARK_INFEASIBLE =
      hook("markInfeasible", NodeKey.class, boolean.class, double.class);
  private static final Method MARK_INTEGER =
      hook("markInteger", NodeKey.class, Optimisation.Result.class);
  private static final Method CUT_FAILURE = hook("onCutFailure");
  private static final Method CUT_SUCCESS = hook("onCutSuccess", NodeKey.class);
  private static final Method NODE_SOLVED =
      hook("onNodeSolved", NodeKey.class, Optimisation.Result.class, double.class, boolean.class);
  private static final Method SCORE =
      hook("scoreBranch", int.class, double.class, double.class, boolean.class);
  private static final Method SCORE_DOWN =
      hook("scoreBranchDown", int.class, double.class, boolean.class);
  private static final Method SCORE_UP = hook("scoreBranchUp", int.class, double.class, boolean.class);

  private final ProgressTicker ticker;
  private final double constant;
  private final boolean minimise;
  private double rootBound = Double.NaN;

  ProgressStrategy(
      ExpressionsBasedModel model,
      IntegerStrategy strategy,
      ProgressTicker ticker,
      double constant,
      boolean minimise) {
    super(model, strategy);
    this.ticker = ticker;
    this.constant = constant;
    this.minimise = minimise;
  }

  private static Method hook(String name, Class<?>... types) {
    try {
      Method m = ModelStrategy.class.getDeclaredMethod(name, types);
      m.setAccessible(true);
      return m;
    } catch (ReflectiveOperationException | RuntimeException e) {
      throw new IllegalStateException("ojAlgo's strategy has no hook " + name + ": " + e, e);
    }
  }

  private Object call(Method m, Object... args) {
    try {
      return m.invoke(delegate, args);
    } catch (InvocationTargetException e) {
      Throwable cause = e.getCause();
      if (cause instanceof RuntimeException) {
        throw (RuntimeException) cause;
      }
      if (cause instanceof Error) {
        throw (Error) cause;
      }
      throw new IllegalStateException(cause);
    } catch (IllegalAccessException e) {
      throw new IllegalStateException(e);
    }
  }

  @Override
  protected ModelStrategy initialise(
      MultiaryFunction.TwiceDifferentiable<Double> function, Access1D<?> point) {
    call(INITIALISE, function, point);
    return this;
  }

  @Override
  protected boolean isCutRatherThanBranch(
      NodeKey node, int index, double value, double objective, Optimisation.Result best) {
    return (Boolean) call(CUT_OR_BRANCH, node, index, value, objective, best);
  }

  @Override
  protected void markInfeasible(NodeKey node, boolean incumbent, double value) {
    call(MARK_INFEASIBLE, node, incumbent, value);
  }

  @Override
  protected void markInteger(NodeKey node, Optimisation.Result result) {
    call(MARK_INTEGER, node, result);
    ticker.incumbent(result.getValue() + constant);
  }

  @Override
  protected void onCutFailure() {
    call(CUT_FAILURE);
  }

  @Override
  protected void onCutSuccess(NodeKey node) {
    call(CUT_SUCCESS, node);
  }

  @Override
  protected void onNodeSolved(
      NodeKey node, Optimisation.Result result, double value, boolean minimisation) {
    call(NODE_SOLVED, node, result, value, minimisation);
    if (node.depth == 0 && Double.isFinite(value)) {
      double bound = value + constant;
      if (Double.isNaN(rootBound) || (minimise ? bound > rootBound : bound < rootBound)) {
        rootBound = bound;
        ticker.bound(bound);
      }
    }
  }

  @Override
  protected double scoreBranch(int index, double fraction, double displacement, boolean found) {
    return (Double) call(SCORE, index, fraction, displacement, found);
  }

  @Override
  protected double scoreBranchDown(int index, double fraction, boolean found) {
    return (Double) call(SCORE_DOWN, index, fraction, found);
  }

  @Override
  protected double scoreBranchUp(int index, double fraction, boolean found) {
    return (Double) call(SCORE_UP, index, fraction, found);
  }
}
