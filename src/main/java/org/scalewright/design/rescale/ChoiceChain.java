package org.scalewright.design.rescale;

/**
 * Exact dynamic programme for choosing one option per key along a run of keys, minimising
 * Σ cost[k][option] + changeCost × (number of changes of wire between neighbouring keys)
 * + Σ step(k, previous option, option), over the sequences whose every transition is allowed.
 * An infinite cost marks an option that is not allowed at a key. Each option belongs to a
 * wire ({@code wire[k][j]}, an index into one list shared by all keys, thickest first): a
 * change of wire costs {@code changeCost}, and where the wire may not grow toward the treble a
 * transition is allowed only to the same or a later (thinner) wire. O(keys × options²).
 */
final class ChoiceChain {

    /** An extra cost for going from option {@code i} at key index {@code k − 1} to option {@code j} at {@code k}. */
    @FunctionalInterface
    interface StepCost {
        double cost(int k, int i, int j);
    }

    /** Whether option {@code j} at key index {@code k} may follow option {@code i} at {@code k − 1}. */
    @FunctionalInterface
    interface Allowed {
        boolean test(int k, int i, int j);
    }

    /**
     * The chosen option per key with the total cost.
     *
     * @param choice option index per key
     * @param total  the objective at the optimum
     */
    record Result(int[] choice, double total) {
    }

    private ChoiceChain() {
    }

    /**
     * Options are wires ordered thickest first; the wire may not grow toward the treble.
     *
     * @param cost       cost[k][j] of wire j at key index k, &ge; 0, or +∞ where not allowed
     * @param changeCost cost of each change of wire between neighbouring keys, &ge; 0
     * @param step       extra transition cost, or null for none
     * @return the optimum, or null when no allowed sequence exists
     */
    static Result monotone(double[][] cost, double changeCost, StepCost step) {
        int[][] wire = new int[cost.length][];
        for (int k = 0; k < cost.length; k++) {
            wire[k] = new int[cost[k].length];
            for (int j = 0; j < wire[k].length; j++) {
                wire[k][j] = j;
            }
        }
        return solve(cost, wire, changeCost, step, (k, i, j) -> i <= j);
    }

    /**
     * @param cost       cost[k][j] of option j at key index k, &ge; 0, or +∞ where not allowed
     *                   (rows may differ in length)
     * @param wire       wire[k][j]: the wire of option j at key index k
     * @param changeCost cost of each change of wire between neighbouring keys, &ge; 0
     * @param step       extra transition cost, or null for none
     * @param allowed    which transitions are allowed
     * @return the optimum, or null when no allowed sequence exists
     */
    static Result solve(double[][] cost, int[][] wire, double changeCost, StepCost step, Allowed allowed) {
        int n = cost.length;
        if (n == 0) {
            return new Result(new int[0], 0);
        }
        double[][] best = new double[n][];
        int[][] from = new int[n][];
        best[0] = cost[0].clone();
        from[0] = new int[cost[0].length];
        for (int k = 1; k < n; k++) {
            int m = cost[k].length;
            best[k] = new double[m];
            from[k] = new int[m];
            for (int j = 0; j < m; j++) {
                double here = cost[k][j];
                best[k][j] = Double.POSITIVE_INFINITY;
                from[k][j] = -1;
                if (here == Double.POSITIVE_INFINITY) {
                    continue;
                }
                for (int i = 0; i < best[k - 1].length; i++) {
                    double prev = best[k - 1][i];
                    if (prev == Double.POSITIVE_INFINITY || !allowed.test(k, i, j)) {
                        continue;
                    }
                    double c = prev + (wire[k - 1][i] == wire[k][j] ? 0 : changeCost)
                            + (step == null ? 0 : step.cost(k, i, j));
                    if (c < best[k][j]) {
                        best[k][j] = c;
                        from[k][j] = i;
                    }
                }
                best[k][j] += here;
            }
        }
        int end = -1;
        for (int j = 0; j < best[n - 1].length; j++) {
            if (best[n - 1][j] < Double.POSITIVE_INFINITY && (end < 0 || best[n - 1][j] < best[n - 1][end])) {
                end = j;
            }
        }
        if (end < 0) {
            return null;
        }
        int[] choice = new int[n];
        choice[n - 1] = end;
        for (int k = n - 1; k > 0; k--) {
            choice[k - 1] = from[k][choice[k]];
        }
        return new Result(choice, best[n - 1][end]);
    }

    /**
     * For the thickest-first, never-growing case: the first key index that no allowed sequence
     * reaches, or -1 when every key is reached (used to say why a plan is impossible).
     */
    static int firstUnreachable(double[][] cost) {
        int n = cost.length;
        if (n == 0) {
            return -1;
        }
        int lowest = -1;
        for (int j = 0; j < cost[0].length; j++) {
            if (cost[0][j] < Double.POSITIVE_INFINITY) {
                lowest = j;
                break;
            }
        }
        if (lowest < 0) {
            return 0;
        }
        for (int k = 1; k < n; k++) {
            int next = -1;
            for (int j = lowest; j < cost[k].length; j++) {
                if (cost[k][j] < Double.POSITIVE_INFINITY) {
                    next = j;
                    break;
                }
            }
            if (next < 0) {
                return k;
            }
            lowest = next;
        }
        return -1;
    }
}
