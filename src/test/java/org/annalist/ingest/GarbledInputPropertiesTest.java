package org.annalist.ingest;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.Size;

/** Whatever the bytes, the reader answers with series or with its own data-problem error, never anything else. */
class GarbledInputPropertiesTest {

    private static final String VALID = "Guest nights by month\nmonth;nights;arrivals\n2024-01;\"12.345\";4 001p\n"
            + "2024-02;13.000;4 100\n2024-03;:;4 300e\n2024-04;14.120;4 410\nSource: invented\n";

    private static void readsOrRefuses(byte[] bytes) {
        try {
            ReadResult read = new SeriesFileReader(ReadOptions.defaults()).read("fuzz.csv", bytes);
            assertThat(read.series()).isNotEmpty();
        } catch (DataProblemException refused) {
            assertThat(refused.problems()).isNotEmpty().allSatisfy(p -> assertThat(p.file()).isEqualTo("fuzz.csv"));
        }
    }

    @Property(tries = 400)
    void arbitraryBytes(@ForAll @Size(max = 400) byte[] bytes) {
        readsOrRefuses(bytes);
    }

    @Property(tries = 400)
    void garbledVariantsOfAValidFile(@ForAll("edits") List<Edit> edits) {
        StringBuilder text = new StringBuilder(VALID);
        for (Edit edit : edits) {
            edit.apply(text);
        }
        readsOrRefuses(text.toString().getBytes(StandardCharsets.UTF_8));
    }

    @Property(tries = 200)
    void arbitraryTextInAPeriodTable(@ForAll("cells") List<String> cells) {
        StringBuilder text = new StringBuilder("period,value\n");
        for (int i = 0; i < cells.size(); i++) {
            text.append(i % 2 == 0 ? cells.get(i) : "2024-0" + (i % 9 + 1)).append(',').append(cells.get(i)).append('\n');
        }
        readsOrRefuses(text.toString().getBytes(StandardCharsets.UTF_8));
    }

    /** Delete, insert or replace one character at a position (taken modulo the text's length). */
    record Edit(int kind, int position, char c) {
        void apply(StringBuilder text) {
            int at = text.length() == 0 ? 0 : Math.floorMod(position, text.length());
            switch (kind) {
                case 0 -> { if (text.length() > 0) { text.deleteCharAt(at); } }
                case 1 -> text.insert(at, c);
                default -> { if (text.length() > 0) { text.setCharAt(at, c); } }
            }
        }
    }

    @Provide
    Arbitrary<List<Edit>> edits() {
        Arbitrary<Character> chars = Arbitraries.of(';', ',', '"', '\n', '\r', ':', '.', '-', '/', 'Q', 'W', 'p', '0', '9',
                ' ', '\t', '\uFEFF', '\u0000', 'é');
        Arbitrary<Edit> edit = net.jqwik.api.Combinators.combine(Arbitraries.integers().between(0, 2),
                Arbitraries.integers().between(0, 10_000), chars).as(Edit::new);
        return edit.list().ofMinSize(1).ofMaxSize(12);
    }

    @Provide
    Arbitrary<List<String>> cells() {
        return Arbitraries.strings().withChars("0123456789.,-/:QWMpe aA\"").ofMaxLength(12).list().ofMaxSize(30);
    }
}
