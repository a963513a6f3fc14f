// The editing core: add, edit, delete, duplicate, undo/redo, dirty flag, save and recovery.
using Study.App.Tui.Editing;
using Study.App.Tui;
using Study.Core.Io;
using Study.Core.Model;

namespace Study.App.Tests.Tui;

public sealed class EditSessionTests : IDisposable
{
    private readonly TempFolder temp = new();

    public void Dispose() => temp.Dispose();

    private EditSession SavedSession(out string path)
    {
        path = temp.File("sample.study.json");
        NetworkFile.Write(SampleNetwork.Build(), path);
        File.SetLastWriteTimeUtc(path, DateTime.UtcNow.AddMinutes(-5));
        return EditSession.Open(path, userFolder: temp.File("user"));
    }

    [Fact]
    public void Add_edit_duplicate_and_delete_change_the_network_and_set_dirty()
    {
        EditSession s = SavedSession(out _);
        Assert.False(s.Dirty);
        s.Add(ElementKind.Load, new Load { Id = "L2", Bus = "B11", PMw = 1 });
        Assert.True(s.Dirty);
        s.Replace(ElementKind.Load, "L2", new Load { Id = "L2", Bus = "B11", PMw = 2.5 });
        Assert.Equal(2.5, s.Network.Loads.Single(l => l.Id == "L2").PMw);
        string copy = s.Duplicate(ElementKind.Load, "L2");
        Assert.Equal("L2-2", copy);
        Assert.Equal(3, s.Network.Loads.Count);
        Assert.True(s.Delete(ElementKind.Load, "L2").Deleted);
        Assert.Equal(["L1", "L2-2"], s.Network.Loads.Select(l => l.Id));
    }

    [Fact]
    public void Replacing_an_element_with_an_equal_one_is_no_edit()
    {
        EditSession s = SavedSession(out _);
        Network before = s.Network;
        Load load = before.Loads.Single(l => l.Id == "L1");
        Assert.False(s.Replace(ElementKind.Load, "L1", load with { })); // a copy, equal field by field
        Assert.Same(before, s.Network);
        Assert.False(s.CanUndo);
        Assert.False(s.Dirty);
        Assert.True(s.Replace(ElementKind.Load, "L1", load with { PMw = load.PMw + 1 }));
        Assert.Equal("edit load L1", s.UndoName);
    }

    [Fact]
    public void An_id_already_used_in_the_family_is_refused()
    {
        EditSession s = SavedSession(out _);
        // Loads and shunts share one id family (README, Network files).
        Assert.Throws<ArgumentException>(() => s.Add(ElementKind.Shunt, new Shunt { Id = "L1", Bus = "B11" }));
    }

    [Fact]
    public void Undo_and_redo_walk_the_snapshots_and_undo_to_the_saved_state_is_clean()
    {
        EditSession s = SavedSession(out _);
        Network original = s.Network;
        s.Replace(ElementKind.Bus, "B11F", new Bus { Id = "B11F", Kv = 11, VMin = 0.94 });
        s.Delete(ElementKind.Breaker, "CB1");
        Assert.True(s.Undo());
        Assert.Single(s.Network.Breakers);
        Assert.True(s.Undo());
        Assert.Same(original, s.Network);
        Assert.False(s.Dirty);
        Assert.False(s.Undo());
        Assert.True(s.Redo());
        Assert.Equal(0.94, s.Network.FindBus("B11F")!.VMin);
        Assert.True(s.Dirty);
    }

    [Fact]
    public void Deleting_a_referenced_bus_reports_the_referencing_elements_and_cascades_on_request()
    {
        EditSession s = SavedSession(out _);
        DeleteResult refused = s.Delete(ElementKind.Bus, "B11");
        Assert.False(refused.Deleted);
        Assert.Equal(
            ["line F1 (from)", "transformer T1 (lv)", "breaker CB1 (bus)"],
            refused.References.Select(r => r.ToString()));
        Assert.NotNull(s.Network.FindBus("B11"));

        DeleteResult done = s.Delete(ElementKind.Bus, "B11", cascade: true);
        Assert.True(done.Deleted);
        Assert.Null(s.Network.FindBus("B11"));
        Assert.Empty(s.Network.Lines);
        Assert.Empty(s.Network.Transformers);
        Assert.Empty(s.Network.Breakers);
        Assert.Single(s.Network.Loads); // L1 sits on B11F, not on B11
    }

    [Fact]
    public void Renaming_a_bus_renames_its_references()
    {
        EditSession s = SavedSession(out _);
        s.Replace(ElementKind.Bus, "B11", new Bus { Id = "MAIN11", Kv = 11 });
        Assert.Equal("MAIN11", s.Network.Transformers[0].Lv);
        Assert.Equal("MAIN11", s.Network.Lines[0].From);
        Assert.Equal("MAIN11", s.Network.Breakers[0].Bus);
    }

    [Fact]
    public void Save_then_reopen_finds_the_change()
    {
        EditSession s = SavedSession(out string path);
        s.Replace(ElementKind.Load, "L1", new Load { Id = "L1", Bus = "B11F", PMw = 6.5, QMvar = 2 });
        s.Save();
        Assert.False(s.Dirty);
        Assert.False(File.Exists(s.RecoveryPath));
        EditSession again = EditSession.Open(path, userFolder: temp.File("user"));
        Assert.Equal(6.5, again.Network.Loads[0].PMw);
        Assert.False(again.RecoveryWaiting);
    }

    [Fact]
    public void A_recovery_file_is_written_after_an_edit_and_offered_and_loaded_next_session()
    {
        EditSession s = SavedSession(out string path);
        s.Add(ElementKind.Bus, new Bus { Id = "NEW", Kv = 11 });
        Assert.Equal(path + ".recovery.json", s.RecoveryPath);
        Assert.True(File.Exists(s.RecoveryPath));

        // The program "crashes" here: no save, no close.
        EditSession next = EditSession.Open(path, userFolder: temp.File("user"));
        Assert.True(next.RecoveryWaiting);
        Assert.Null(next.Network.FindBus("NEW"));
        next.AcceptRecovery();
        Assert.NotNull(next.Network.FindBus("NEW"));
        Assert.True(next.Dirty);
        Assert.True(next.Undo());
        Assert.Null(next.Network.FindBus("NEW"));
    }

    [Fact]
    public void A_discarded_recovery_file_is_deleted_and_not_offered_again()
    {
        EditSession s = SavedSession(out string path);
        s.Add(ElementKind.Bus, new Bus { Id = "NEW", Kv = 11 });
        EditSession next = EditSession.Open(path, userFolder: temp.File("user"));
        next.DiscardRecovery();
        Assert.False(File.Exists(next.RecoveryPath));
        Assert.False(EditSession.Open(path, userFolder: temp.File("user")).RecoveryWaiting);
    }

    [Fact]
    public void The_demo_keeps_its_recovery_copy_in_the_user_folder_and_asks_for_a_path_to_save()
    {
        string demo = temp.File("demo.study.json");
        NetworkFile.Write(SampleNetwork.Build(), demo);
        EditSession s = EditSession.Open(demo, isDemo: true, userFolder: temp.File("user"));
        Assert.True(s.NeedsPathToSave);
        s.Add(ElementKind.Bus, new Bus { Id = "NEW", Kv = 11 });
        Assert.Equal(temp.File(Path.Combine("user", "demo.study.json.recovery.json")), s.RecoveryPath);
        Assert.True(File.Exists(s.RecoveryPath));
        Assert.Throws<InvalidOperationException>(s.Save);
        string copy = temp.File("mine.study.json");
        s.SaveAs(copy);
        Assert.False(s.NeedsPathToSave);
        Assert.NotNull(NetworkFile.Read(copy).FindBus("NEW"));
    }
}
