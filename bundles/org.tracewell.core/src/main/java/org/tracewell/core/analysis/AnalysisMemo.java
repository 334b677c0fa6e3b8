package org.tracewell.core.analysis;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CancellationException;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.Supplier;

import org.tracewell.core.mapping.MappedAxis;
import org.tracewell.core.mapping.MappedContour;
import org.tracewell.engine.axis.AxisDynamics;
import org.tracewell.engine.axis.AxisModel;
import org.tracewell.engine.contour.CircleTestSetup;
import org.tracewell.engine.path.ContourPlane;
import org.tracewell.engine.path.Path;
import org.tracewell.engine.path.Segment;
import org.tracewell.engine.sim.AxisLoop;
import org.tracewell.engine.trajectory.AxisLimits;
import org.tracewell.engine.trajectory.PathLimits;

/**
 * Results of the per-axis loop analyses and of the contour runs, kept by the value of their inputs. Analyses are
 * pure functions of their inputs, so after an edit only what the edit changed is recomputed (an undo finds the old
 * results again), and a run two contours share — a circle test programmed CCW runs CW too — is simulated once.
 * Thread-safe: a result asked for twice at the same time is computed once, the second caller waits for it. Each
 * store is bounded and forgets the least recently used result first; a computation that fails is not kept.
 */
public final class AnalysisMemo {

    private static final AnalysisMemo NONE = new AnalysisMemo(0, 0);

    private final Store<AxisModel, AxisDynamics> axes;
    private final Store<AxisModel, AxisLoop> loops;
    private final Store<RunKey, ContourRun> runs;

    private AnalysisMemo(int axisCapacity, int runCapacity) {
        axes = new Store<>(axisCapacity);
        loops = new Store<>(axisCapacity);
        runs = new Store<>(runCapacity);
    }

    /** Keeps nothing across analyses (one analysis still shares its own runs and axes within itself). */
    public static AnalysisMemo none() {
        return NONE;
    }

    /** True for {@link #none()}. */
    boolean keepsNothing() {
        return this == NONE;
    }

    /**
     * Keeps up to {@code axisCapacity} axis analyses and {@code runCapacity} contour runs (a run holds every sample,
     * about 1 MB per 10⁴ samples, so keep that bound modest).
     */
    public static AnalysisMemo bounded(int axisCapacity, int runCapacity) {
        if (axisCapacity < 1 || runCapacity < 1) {
            throw new IllegalArgumentException("memo capacities must be ≥ 1, got " + axisCapacity + " axes and "
                    + runCapacity + " runs (use AnalysisMemo.none() to keep nothing)");
        }
        return new AnalysisMemo(axisCapacity, runCapacity);
    }

    /** Both loops of {@code model} analysed ({@link AxisModel#analyze()}); computed unless an equal model was. */
    public AxisDynamics dynamics(AxisModel model) {
        return axes.get(model, model::analyze);
    }

    /** The dynamics of {@code model} if they are already computed (never computes, never waits). */
    public Optional<AxisDynamics> knownDynamics(AxisModel model) {
        return axes.peek(model);
    }

    /** The closed loop of {@code model} for simulation ({@link AxisModel#toAxisLoop()}); cheap, kept all the same. */
    public AxisLoop loop(AxisModel model) {
        return loops.get(model, model::toAxisLoop);
    }

    /** How many axis analyses were computed (not found) so far. */
    public long axisComputations() {
        return axes.computed.get();
    }

    /** How many contour runs were simulated (not found) so far. */
    public long runComputations() {
        return runs.computed.get();
    }

    ContourRun run(RunKey key, Supplier<ContourRun> simulate) {
        return runs.get(key, simulate);
    }

    /**
     * Everything a contour run depends on, by value: what is tracked (a circle-test set-up, or the programmed path),
     * the path limits and sample period, and each axis's model and limits.
     */
    record RunKey(Object tracked, PathLimits limits, double samplePeriod, AxisModel firstModel,
            AxisLimits firstLimits, AxisModel secondModel, AxisLimits secondLimits) {

        static RunKey circle(MappedContour contour, CircleTestSetup setup, MappedAxis first, MappedAxis second) {
            return new RunKey(setup, contour.limits(), contour.samplePeriod(), first.model(), first.limits(),
                    second.model(), second.limits());
        }

        static RunKey programmed(MappedContour contour, MappedAxis first, MappedAxis second) {
            return new RunKey(PathValue.of(contour.path()), contour.limits(), contour.samplePeriod(), first.model(),
                    first.limits(), second.model(), second.limits());
        }
    }

    /** A path by value (the engine's Path compares by identity): plane, segments and requested exact stops. */
    record PathValue(ContourPlane plane, List<Segment> segments, List<Boolean> exactStops) {

        static PathValue of(Path path) {
            Boolean[] stops = new Boolean[Math.max(0, path.segmentCount() - 1)];
            for (int j = 0; j < stops.length; j++) {
                stops[j] = path.isExactStopRequested(j);
            }
            return new PathValue(path.plane(), path.segments(), List.of(stops));
        }
    }

    /** A bounded, least-recently-used map of results being computed or computed, by key. */
    private static final class Store<K, V> {
        private final int capacity;
        private final Map<K, CompletableFuture<V>> entries;
        final AtomicLong computed = new AtomicLong();

        Store(int capacity) {
            this.capacity = capacity;
            this.entries = new LinkedHashMap<>(16, 0.75f, true) {
                @Override
                protected boolean removeEldestEntry(Map.Entry<K, CompletableFuture<V>> eldest) {
                    return size() > Store.this.capacity;
                }
            };
        }

        Optional<V> peek(K key) {
            CompletableFuture<V> entry;
            synchronized (entries) {
                entry = entries.get(key);
            }
            return entry != null && entry.isDone() && !entry.isCompletedExceptionally()
                    ? Optional.of(entry.join()) : Optional.empty();
        }

        V get(K key, Supplier<V> compute) {
            if (capacity == 0) {
                computed.incrementAndGet();
                return compute.get();
            }
            while (true) {
                CompletableFuture<V> mine = new CompletableFuture<>();
                CompletableFuture<V> existing;
                synchronized (entries) {
                    existing = entries.putIfAbsent(key, mine);
                }
                if (existing == null) {
                    return computeInto(key, mine, compute);
                }
                try {
                    return existing.join();
                } catch (CompletionException | CancellationException failed) {
                    // The other caller's computation failed and was dropped; compute it here instead.
                    synchronized (entries) {
                        entries.remove(key, existing);
                    }
                }
            }
        }

        private V computeInto(K key, CompletableFuture<V> mine, Supplier<V> compute) {
            try {
                V value = compute.get();
                computed.incrementAndGet();
                mine.complete(value);
                return value;
            } catch (RuntimeException | Error e) {
                synchronized (entries) {
                    entries.remove(key, mine);
                }
                mine.completeExceptionally(e);
                throw e;
            }
        }
    }
}
