package dev.coilwise.scatter;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.ForkJoinTask;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * One block of made springs of every design of a run, worked in parallel while their deviations are still being
 * drawn. The deviations come from one seeded stream, so they are drawn in order by one thread, the caller, in steps of
 * {@link MonteCarlo#PROGRESS_STEP} made springs; meanwhile the pool's threads work the steps already drawn. A task is
 * one step of one design, taken in turn (step by step, design by design); the caller joins in once it has drawn the
 * block. Every task writes only its own samples and counts, so the result does not depend on the threads or their
 * timing.
 */
final class SampleBlock {
    private final SampleEvaluator[] evaluators;
    private final double[][][] values;
    private final double[] z;
    private final int offset;
    private final int length;
    private final int steps;
    private final int tasks;
    private final int[] met;
    private final int[] invalid;
    private final MonteCarlo.Reporter reporter;
    private final AtomicInteger next = new AtomicInteger();
    /** Steps drawn so far; guarded by {@code this}. */
    private int drawn;
    /** Set when the drawing stopped short (an exception in the caller); guarded by {@code this}. */
    private boolean abandoned;

    /**
     * @param evaluators one per design
     * @param values     per design, per figure, the figures of every sample of the run (this block fills its part)
     * @param z          room for the block's deviations, {@link DeviationSampler#DRAWS} per made spring
     * @param offset     the run's index of the block's first made spring
     * @param length     made springs in the block
     * @param met        per design, made springs meeting the requirement (this block adds its count)
     * @param invalid    per design, made springs that cannot exist (this block adds its count)
     */
    SampleBlock(SampleEvaluator[] evaluators, double[][][] values, double[] z, int offset, int length, int[] met,
                int[] invalid, MonteCarlo.Reporter reporter) {
        this.evaluators = evaluators;
        this.values = values;
        this.z = z;
        this.offset = offset;
        this.length = length;
        this.steps = (length + MonteCarlo.PROGRESS_STEP - 1) / MonteCarlo.PROGRESS_STEP;
        this.tasks = steps * evaluators.length;
        this.met = met;
        this.invalid = invalid;
        this.reporter = reporter;
    }

    /** Draws the block's deviations from {@code sampler} and works every made spring of it; returns when done. */
    void run(DeviationSampler sampler) {
        int[][] counts = new int[tasks][];
        ForkJoinPool pool = ForkJoinTask.inForkJoinPool() ? ForkJoinTask.getPool() : ForkJoinPool.commonPool();
        int helpers = Math.min(tasks - 1, ForkJoinTask.inForkJoinPool() ? pool.getParallelism() - 1
                : ForkJoinPool.getCommonPoolParallelism());
        List<ForkJoinTask<?>> started = new ArrayList<>();
        for (int i = 0; i < helpers; i++) {
            started.add(ForkJoinTask.adapt(() -> work(counts)).fork());
        }
        try {
            draw(sampler);
        } finally {
            synchronized (this) {
                abandoned = drawn < steps;
                notifyAll();
            }
        }
        work(counts);
        for (ForkJoinTask<?> t : started) {
            t.join();
        }
        for (int t = 0; t < tasks; t++) {
            met[t % evaluators.length] += counts[t][0];
            invalid[t % evaluators.length] += counts[t][1];
        }
    }

    private void draw(DeviationSampler sampler) {
        double[] one = new double[DeviationSampler.DRAWS];
        for (int s = 0; s < steps; s++) {
            int to = Math.min(length, (s + 1) * MonteCarlo.PROGRESS_STEP);
            for (int i = s * MonteCarlo.PROGRESS_STEP; i < to; i++) {
                sampler.next(one);
                System.arraycopy(one, 0, z, i * DeviationSampler.DRAWS, DeviationSampler.DRAWS);
            }
            synchronized (this) {
                drawn = s + 1;
                notifyAll();
            }
        }
    }

    /** Takes tasks in turn until none is left; each waits until its step is drawn. */
    private void work(int[][] counts) {
        for (int t = next.getAndIncrement(); t < tasks; t = next.getAndIncrement()) {
            int step = t / evaluators.length;
            int design = t % evaluators.length;
            if (!awaitDrawn(step)) {
                return;
            }
            int from = step * MonteCarlo.PROGRESS_STEP;
            int to = Math.min(length, from + MonteCarlo.PROGRESS_STEP);
            counts[t] = work(evaluators[design], from, to, values[design]);
            reporter.advanced(to - from);
        }
    }

    /** Whether step {@code step} is drawn, waiting for it; false when the drawing was abandoned. */
    private synchronized boolean awaitDrawn(int step) {
        boolean interrupted = false;
        while (drawn <= step && !abandoned) {
            try {
                wait();
            } catch (InterruptedException e) {
                interrupted = true;
            }
        }
        if (interrupted) {
            Thread.currentThread().interrupt();
        }
        return drawn > step;
    }

    /**
     * Works made springs {@code from} (incl.) to {@code to} (excl.) of the block; writes their figures into
     * {@code figures} and returns {met, invalid}.
     */
    private int[] work(SampleEvaluator evaluator, int from, int to, double[][] figures) {
        int width = figures.length;
        double[] zi = new double[DeviationSampler.DRAWS];
        double[] out = new double[width];
        int ok = 0;
        int bad = 0;
        for (int i = from; i < to; i++) {
            System.arraycopy(z, i * DeviationSampler.DRAWS, zi, 0, DeviationSampler.DRAWS);
            int outcome = evaluator.outcome(zi, out);
            if (outcome == SampleEvaluator.INVALID) {
                bad++;
            } else if (outcome == SampleEvaluator.MEETS) {
                ok++;
            }
            for (int j = 0; j < width; j++) {
                figures[j][offset + i] = out[j];
            }
        }
        return new int[] {ok, bad};
    }
}
