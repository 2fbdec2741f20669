package dockline.scratch;
import dockline.replay.*; import dockline.model.*; import dockline.solve.*; import dockline.io.*; import java.nio.file.*;
class ScratchTest {
  @org.junit.jupiter.api.Test void show() throws Exception {
    for (String f : new String[]{"missions/night-round.yaml","missions/late-return.yaml","missions/supply-run.yaml"}) {
      Mission m = MissionLoader.load(Path.of(f));
      MissionReplays mr = MissionReplays.of(m, ReserveOptions.defaults());
      Replay r = mr.worstCase();
      System.out.println("==== "+f); System.out.print(ReplayFormats.table(r)); r.explanation().forEach(System.out::println);
    }
  }
}
