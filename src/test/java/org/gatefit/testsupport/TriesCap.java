package org.gatefit.testsupport;

import java.util.List;
import net.jqwik.api.Tuple;
import net.jqwik.api.lifecycle.AroundTryHook;
import net.jqwik.api.lifecycle.Lifespan;
import net.jqwik.api.lifecycle.PropagationMode;
import net.jqwik.api.lifecycle.Store;
import net.jqwik.api.lifecycle.TryExecutionResult;
import net.jqwik.api.lifecycle.TryExecutor;
import net.jqwik.api.lifecycle.TryLifecycleContext;

/**
 * Caps every jqwik property at {@code -Dgatefit.tries.max=N} tries, for mutation testing: PIT runs
 * the properties once per mutant, and at their own 200–3,000 tries the match package's run does not
 * finish in an hour on two cores. Without the property (every normal build) it changes nothing.
 * Registered for all properties through {@code META-INF/services/net.jqwik.api.lifecycle.LifecycleHook}.
 */
public final class TriesCap implements AroundTryHook {
    /** The cap, or 0 for none. */
    static int cap() {
        String v = System.getProperty("gatefit.tries.max");
        return v == null || v.isBlank() ? 0 : Integer.parseInt(v.trim());
    }

    @Override
    public PropagationMode propagateTo() {
        return PropagationMode.ALL_DESCENDANTS;
    }

    @Override
    public TryExecutionResult aroundTry(TryLifecycleContext context, TryExecutor aTry, List<Object> parameters)
            throws Throwable {
        int cap = cap();
        if (cap <= 0) {
            return aTry.execute(parameters);
        }
        Store<int[]> tries = Store.getOrCreate(Tuple.of(TriesCap.class, "tries"), Lifespan.PROPERTY, () -> new int[1]);
        if (tries.get()[0] >= cap) {
            return TryExecutionResult.satisfied(true); // the property ends here, as satisfied as it was
        }
        tries.get()[0]++;
        return aTry.execute(parameters);
    }
}
