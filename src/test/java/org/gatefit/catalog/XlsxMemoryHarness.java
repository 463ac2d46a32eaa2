package org.gatefit.catalog;

import java.io.OutputStream;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryMXBean;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.streaming.SXSSFWorkbook;

/**
 * Measures the heap an {@code .xlsx} read holds as the rows go by (docs/PERFORMANCE.md): writes a
 * workbook of invented switches with POI's streaming writer, reads it through {@link SheetReader}
 * and prints the heap in use after a full collection every 10,000 rows. A harness, not a test (no
 * figure is asserted):
 * {@code java -Xmx256m -cp target/test-classes:target/classes:$(deps) org.gatefit.catalog.XlsxMemoryHarness 100000}.
 */
public final class XlsxMemoryHarness {
    private XlsxMemoryHarness() {
    }

    public static void main(String[] args) throws Exception {
        int rows = args.length > 0 ? Integer.parseInt(args[0]) : 100_000;
        Path dir = Files.createTempDirectory("xlsx-memory");
        Path file = dir.resolve("switches.xlsx");
        String[] head = {"Part Number", "Mfr", "Type", "Vds (V)", "Rds(on) mOhm", "Qg (nC)", "Ciss, pF", "Vgs max", "Status"};
        try (SXSSFWorkbook wb = new SXSSFWorkbook(100); OutputStream out = Files.newOutputStream(file)) {
            Sheet s = wb.createSheet("Switches");
            s.createRow(0).createCell(0).setCellValue("Synthetic approved switches");
            Row h = s.createRow(1);
            for (int i = 0; i < head.length; i++) {
                h.createCell(i).setCellValue(head[i]);
            }
            for (int r = 0; r < rows; r++) {
                Row row = s.createRow(r + 2);
                row.createCell(0).setCellValue(String.format("SYN-%07d", r));
                row.createCell(1).setCellValue("Synthmaker " + (r % 40));
                row.createCell(2).setCellValue(r % 3 == 0 ? "SiC" : "Si MOSFET");
                row.createCell(3).setCellValue(40 + r % 1160);
                row.createCell(4).setCellValue(1 + (r % 997) / 10.0);
                row.createCell(5).setCellValue(5 + r % 300);
                row.createCell(6).setCellValue(300 + r % 9000);
                row.createCell(7).setCellValue("±20");
                row.createCell(8).setCellValue(r % 50 == 0 ? "NRND" : "Active");
            }
            wb.write(out);
        }
        MemoryMXBean mem = ManagementFactory.getMemoryMXBean();
        System.out.printf("workbook: %,d rows, %,d bytes; max heap %,d MB%n", rows, Files.size(file),
                Runtime.getRuntime().maxMemory() >> 20);
        System.gc();
        System.out.printf("before reading: %,d KB heap in use%n", mem.getHeapMemoryUsage().getUsed() >> 10);
        long[] n = {0};
        long t0 = System.nanoTime();
        SheetReader.Summary s = SheetReader.read(file, "switches.xlsx", null, row -> {
            if (++n[0] % 10_000 == 0) {
                System.gc();
                System.out.printf("after %,7d rows: %,d KB heap in use%n", n[0], mem.getHeapMemoryUsage().getUsed() >> 10);
            }
        }, new SheetReader.Options(null, 0, null, null, note -> { }));
        System.out.printf("read %,d rows (%d problems) in %.1f s (with a full collection every 10,000 rows)%n", s.rows(),
                s.problemCount(), (System.nanoTime() - t0) / 1e9);
        Files.delete(file);
        Files.delete(dir);
    }
}
