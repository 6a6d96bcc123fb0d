package org.fatefield.circuits.expr;

import org.fatefield.circuits.kinetics.HillFunctions;

/**
 * A rate law compiled for fast repeated evaluation: the tree becomes a tree of small final
 * evaluator objects, with constants folded, integer powers turned into multiplications and Hill
 * functions with constant integer coefficients on the fast path of {@link HillFunctions}. It evaluates only
 * the operations of {@link Node}; nothing else can be reached from a rate law.
 */
public abstract class CompiledExpression {

    CompiledExpression() {
    }

    /** The value for species concentrations {@code x} and parameters {@code p} (neither modified). */
    public abstract double evaluate(double[] x, double[] p);

    /** Compiles {@code node}. */
    public static CompiledExpression compile(Node node) {
        if (node instanceof Node.Constant c) {
            return new Const(c.value());
        }
        if (node instanceof Node.Variable v) {
            return v.species() ? new SpeciesRead(v.index()) : new ParameterRead(v.index());
        }
        if (node instanceof Node.Negate n) {
            return new Neg(compile(n.argument()));
        }
        if (node instanceof Node.Binary b) {
            CompiledExpression l = compile(b.left());
            if (b.operator() == Node.Operator.POWER && b.right() instanceof Node.Constant c
                    && c.value() == Math.rint(c.value()) && c.value() >= 1 && c.value() <= 8) {
                return new IntPow(l, (int) c.value());
            }
            CompiledExpression r = compile(b.right());
            return switch (b.operator()) {
                case ADD -> new Add(l, r);
                case SUBTRACT -> new Sub(l, r);
                case MULTIPLY -> new Mul(l, r);
                case DIVIDE -> new Div(l, r);
                case POWER -> new Pow(l, r);
            };
        }
        Node.Call call = (Node.Call) node;
        CompiledExpression[] a = call.arguments().stream().map(CompiledExpression::compile)
                .toArray(CompiledExpression[]::new);
        return new Call(call.function(), a);
    }

    private static final class Const extends CompiledExpression {
        private final double value;

        Const(double value) {
            this.value = value;
        }

        @Override
        public double evaluate(double[] x, double[] p) {
            return value;
        }
    }

    private static final class SpeciesRead extends CompiledExpression {
        private final int index;

        SpeciesRead(int index) {
            this.index = index;
        }

        @Override
        public double evaluate(double[] x, double[] p) {
            return x[index];
        }
    }

    private static final class ParameterRead extends CompiledExpression {
        private final int index;

        ParameterRead(int index) {
            this.index = index;
        }

        @Override
        public double evaluate(double[] x, double[] p) {
            return p[index];
        }
    }

    private static final class Neg extends CompiledExpression {
        private final CompiledExpression a;

        Neg(CompiledExpression a) {
            this.a = a;
        }

        @Override
        public double evaluate(double[] x, double[] p) {
            return -a.evaluate(x, p);
        }
    }

    private static final class Add extends CompiledExpression {
        private final CompiledExpression a;
        private final CompiledExpression b;

        Add(CompiledExpression a, CompiledExpression b) {
            this.a = a;
            this.b = b;
        }

        @Override
        public double evaluate(double[] x, double[] p) {
            return a.evaluate(x, p) + b.evaluate(x, p);
        }
    }

    private static final class Sub extends CompiledExpression {
        private final CompiledExpression a;
        private final CompiledExpression b;

        Sub(CompiledExpression a, CompiledExpression b) {
            this.a = a;
            this.b = b;
        }

        @Override
        public double evaluate(double[] x, double[] p) {
            return a.evaluate(x, p) - b.evaluate(x, p);
        }
    }

    private static final class Mul extends CompiledExpression {
        private final CompiledExpression a;
        private final CompiledExpression b;

        Mul(CompiledExpression a, CompiledExpression b) {
            this.a = a;
            this.b = b;
        }

        @Override
        public double evaluate(double[] x, double[] p) {
            return a.evaluate(x, p) * b.evaluate(x, p);
        }
    }

    private static final class Div extends CompiledExpression {
        private final CompiledExpression a;
        private final CompiledExpression b;

        Div(CompiledExpression a, CompiledExpression b) {
            this.a = a;
            this.b = b;
        }

        @Override
        public double evaluate(double[] x, double[] p) {
            return a.evaluate(x, p) / b.evaluate(x, p);
        }
    }

    private static final class Pow extends CompiledExpression {
        private final CompiledExpression a;
        private final CompiledExpression b;

        Pow(CompiledExpression a, CompiledExpression b) {
            this.a = a;
            this.b = b;
        }

        @Override
        public double evaluate(double[] x, double[] p) {
            return Math.pow(a.evaluate(x, p), b.evaluate(x, p));
        }
    }

    private static final class IntPow extends CompiledExpression {
        private final CompiledExpression a;
        private final int k;

        IntPow(CompiledExpression a, int k) {
            this.a = a;
            this.k = k;
        }

        @Override
        public double evaluate(double[] x, double[] p) {
            double base = a.evaluate(x, p);
            double r = base;
            for (int i = 1; i < k; i++) {
                r *= base;
            }
            return r;
        }
    }

    private static final class Call extends CompiledExpression {
        private final Node.Function function;
        private final CompiledExpression[] a;

        Call(Node.Function function, CompiledExpression[] a) {
            this.function = function;
            this.a = a;
        }

        @Override
        public double evaluate(double[] x, double[] p) {
            double u = a[0].evaluate(x, p);
            return switch (function) {
                case EXP -> Math.exp(u);
                case LOG -> Math.log(u);
                case SQRT -> Math.sqrt(u);
                case ABS -> Math.abs(u);
                case STEP -> u > 0 ? 1.0 : 0.0;
                case MIN -> Math.min(u, a[1].evaluate(x, p));
                case MAX -> Math.max(u, a[1].evaluate(x, p));
                case HILL_ACT -> HillFunctions.activation(u, a[1].evaluate(x, p), a[2].evaluate(x, p));
                case HILL_REP -> HillFunctions.repression(u, a[1].evaluate(x, p), a[2].evaluate(x, p));
                case HILL_SLOPE -> HillFunctions.activationSlope(u, a[1].evaluate(x, p), a[2].evaluate(x, p));
            };
        }
    }
}
