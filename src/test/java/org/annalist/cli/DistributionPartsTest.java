package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.AutoComplete;

/** What the build puts in the distribution from the commands: the completion script, and the demo's data folder. */
class DistributionPartsTest {

    @TempDir
    Path temp;

    @Test
    void completionScriptOffersEveryCommandAndItsOptions() {
        // the build generates completion/annalist.bash the same way (picocli.AutoComplete on the commands)
        String script = AutoComplete.bash("annalist", Main.commandLine());
        for (String command : new String[] {"check", "analyze", "brief", "batch", "demo"}) {
            assertThat(script).contains(command);
        }
        assertThat(script).contains("--horizon", "--generated-at", "--jobs", "ZSH_VERSION");
    }

    @Test
    void demoReadsTheDataOfTheWorkingFolderFirst() throws Exception {
        Path here = Files.createDirectories(temp.resolve("work/demo-data"));
        Path home = Files.createDirectories(temp.resolve("installed/demo-data")).getParent();
        assertThat(DemoCommand.defaultData(here, Optional.of(home.toString()))).isEqualTo(here);
    }

    @Test
    void demoReadsTheInstalledDataWhenTheWorkingFolderHasNone() throws Exception {
        Path here = temp.resolve("work/demo-data");
        Path home = Files.createDirectories(temp.resolve("installed/demo-data")).getParent();
        assertThat(DemoCommand.defaultData(here, Optional.of(home.toString()))).isEqualTo(home.resolve("demo-data"));
    }

    @Test
    void demoKeepsTheWorkingFolderInItsMessageWhenNeitherHasData() {
        Path here = temp.resolve("work/demo-data");
        assertThat(DemoCommand.defaultData(here, Optional.of(temp.resolve("installed").toString()))).isEqualTo(here);
        assertThat(DemoCommand.defaultData(here, Optional.empty())).isEqualTo(here);
    }
}
