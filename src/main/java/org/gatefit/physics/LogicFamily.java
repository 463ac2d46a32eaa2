package org.gatefit.physics;

import java.util.Arrays;
import java.util.stream.Collectors;

/**
 * Logic families a controller output may belong to, with their guaranteed levels: V_OH (output
 * high, min), V_OL (output low, max), V_IH (input high, min), V_IL (input low, max).
 *
 * <p>Sources, with the level values from memory (check against the standard before relying on
 * a margin of a few tens of millivolts):
 * <ul>
 *   <li>{@code ttl-5v}: the classic 5 V TTL levels 2.4 / 0.4 / 2.0 / 0.8 V, V_CC 4.5–5.5 V.</li>
 *   <li>{@code cmos-5v}: 5 V high-speed CMOS (74HC style), V_IH = 0.7·V_CC, V_IL = 0.3·V_CC;
 *       V_OH 4.4 V and V_OL 0.1 V are the light-load (20 µA) limits at V_CC = 4.5 V, the worst
 *       case of the 4.5–5.5 V range, so they are kept fixed over it.</li>
 *   <li>{@code lvttl-3v3}: JEDEC JESD8C.01 LVTTL, 2.4 / 0.4 / 2.0 / 0.8 V, V_DD 3.0–3.6 V (the
 *       standard's normal range; its extended range reaches 2.7 V).</li>
 *   <li>{@code lvcmos-3v3}: JEDEC JESD8C.01 LVCMOS, V_OH = V_DD − 0.2 V, V_OL 0.2 V (100 µA),
 *       V_IH 2.0 V, V_IL 0.8 V, V_DD 3.0–3.6 V (normal range; REFERENCES.md §9: 2.8 V at the minimum
 *       supply).</li>
 *   <li>{@code lvcmos-2v5}: JEDEC JESD8-5, V_OH 2.0 V, V_OL 0.4 V (1 mA), V_IH 1.7 V,
 *       V_IL 0.7 V, V_DD 2.3–2.7 V.</li>
 *   <li>{@code lvcmos-1v8}: JEDEC JESD8-7, V_OH = V_DD − 0.45 V, V_OL 0.45 V (2 mA),
 *       V_IH = 0.65·V_DD, V_IL = 0.35·V_DD, V_DD 1.65–1.95 V.</li>
 * </ul>
 * Levels that the standard gives as fixed numbers do not change with the supply; the others
 * are computed from it. A controller of a family is judged at the worst end of its supply range,
 * the minimum (REFERENCES.md §9: "judge every family at its minimum supply"), where its output high
 * is lowest: {@link #levels()}. The ids are fixed by the stage-sheet format ({@code logic} column).
 */
public enum LogicFamily {
    /** 5 V TTL. */
    TTL_5V("ttl-5v", 5.0, 4.5, 5.5),
    /** 5 V CMOS. */
    CMOS_5V("cmos-5v", 5.0, 4.5, 5.5),
    /** 3.3 V LVTTL, JESD8C.01. */
    LVTTL_3V3("lvttl-3v3", 3.3, 3.0, 3.6),
    /** 3.3 V LVCMOS, JESD8C.01. */
    LVCMOS_3V3("lvcmos-3v3", 3.3, 3.0, 3.6),
    /** 2.5 V, JESD8-5. */
    LVCMOS_2V5("lvcmos-2v5", 2.5, 2.3, 2.7),
    /** 1.8 V, JESD8-7. */
    LVCMOS_1V8("lvcmos-1v8", 1.8, 1.65, 1.95);

    private final String id;
    private final double nominalSupply;
    private final double minSupply;
    private final double maxSupply;

    LogicFamily(String id, double nominalSupply, double minSupply, double maxSupply) {
        this.id = id;
        this.nominalSupply = nominalSupply;
        this.minSupply = minSupply;
        this.maxSupply = maxSupply;
    }

    /**
     * The family with this id ({@code ttl-5v}, {@code cmos-5v}, {@code lvttl-3v3},
     * {@code lvcmos-3v3}, {@code lvcmos-2v5}, {@code lvcmos-1v8}), case-insensitive.
     *
     * @throws IllegalArgumentException naming the valid ids when there is no such family
     */
    public static LogicFamily fromId(String id) {
        if (id != null) {
            String key = id.trim();
            for (LogicFamily f : values()) {
                if (f.id.equalsIgnoreCase(key)) {
                    return f;
                }
            }
        }
        throw new IllegalArgumentException("expected a logic family ("
                + Arrays.stream(values()).map(LogicFamily::id).collect(Collectors.joining(", "))
                + "), got " + (id == null ? "null" : "'" + id + "'"));
    }

    /** The stage-sheet id, e.g. {@code lvcmos-3v3}. */
    public String id() {
        return id;
    }

    /** Nominal supply, V. */
    public double nominalSupply() {
        return nominalSupply;
    }

    /** Lowest supply of the family's range, V. */
    public double minSupply() {
        return minSupply;
    }

    /** Highest supply of the family's range, V. */
    public double maxSupply() {
        return maxSupply;
    }

    /** Levels at the worst end of the supply range, the minimum (where V_OH is lowest). */
    public Levels levels() {
        return levels(minSupply);
    }

    /**
     * Levels at a supply within the family's range.
     *
     * @param supply V_DD or V_CC, V
     * @throws IllegalArgumentException when the supply is outside the family's range
     */
    public Levels levels(double supply) {
        Require.inRange("supply for " + id, "V", supply, minSupply, maxSupply);
        return switch (this) {
            case TTL_5V, LVTTL_3V3 -> new Levels(2.4, 0.4, 2.0, 0.8);
            case CMOS_5V -> new Levels(4.4, 0.1, 0.7 * supply, 0.3 * supply);
            case LVCMOS_3V3 -> new Levels(supply - 0.2, 0.2, 2.0, 0.8);
            case LVCMOS_2V5 -> new Levels(2.0, 0.4, 1.7, 0.7);
            case LVCMOS_1V8 -> new Levels(supply - 0.45, 0.45, 0.65 * supply, 0.35 * supply);
        };
    }

    /**
     * Guaranteed logic levels, V.
     *
     * @param vOh output high, minimum
     * @param vOl output low, maximum
     * @param vIh input high threshold, minimum a receiver needs
     * @param vIl input low threshold, maximum a receiver accepts as low
     */
    public record Levels(double vOh, double vOl, double vIh, double vIl) {
        public Levels {
            Require.finite("V_OH", "V", vOh);
            Require.finite("V_OL", "V", vOl);
            Require.finite("V_IH", "V", vIh);
            Require.finite("V_IL", "V", vIl);
            Require.greater("V_OH above V_OL (V_OH, V_OL)", vOh, vOl);
            Require.greater("V_IH above V_IL (V_IH, V_IL)", vIh, vIl);
        }

        /** Noise margins of these outputs into these inputs (same family). */
        public NoiseMargins selfMargins() {
            return NoiseMargins.of(vOh, vOl, vIh, vIl);
        }
    }
}
