// The network being edited: current snapshot, file, dirty flag, undo/redo, save and recovery.
using Study.Core.Io;
using Study.Core.Model;

namespace Study.App.Tui.Editing;

/// <summary>What a delete did: removed the element, or refused because other elements name the bus.</summary>
public sealed record DeleteResult(bool Deleted, IReadOnlyList<ElementReference> References);

/// <summary>
/// The editing state behind the screens. Networks are immutable records, so every edit keeps the
/// previous whole network as its undo snapshot. After each edit a recovery copy is written.
/// </summary>
public sealed class EditSession
{
    private readonly Stack<(Network Network, string What)> undo = new();
    private readonly Stack<(Network Network, string What)> redo = new();
    private readonly string userFolder;
    private Network saved;

    private EditSession(Network network, string? path, bool isDemo, bool isImported, string userFolder)
    {
        Network = saved = network;
        Path = path;
        IsDemo = isDemo;
        IsImported = isImported;
        this.userFolder = userFolder;
        RecoveryPath = RecoveryFile.PathFor(path, isDemo, userFolder);
        RecoveryWaiting = RecoveryFile.IsWaiting(path, RecoveryPath);
        if (path is not null && ScenarioMemory.Read(userFolder, path) is { } chosen && network.FindScenario(chosen) is { } scenario)
            activeScenario = scenario.Name;
    }

    private string? activeScenario;

    public Network Network { get; private set; }

    /// <summary>The file the network came from or was last saved to; null when untitled.</summary>
    public string? Path { get; private set; }

    public bool IsDemo { get; private set; }

    /// <summary>True when the file is an imported case (not a network file), so Save needs a new path.</summary>
    public bool IsImported { get; private set; }

    public bool Dirty => !ReferenceEquals(Network, saved);
    public bool CanUndo => undo.Count > 0;
    public bool CanRedo => redo.Count > 0;

    /// <summary>
    /// The scenario studies run in; null for the case as entered. Remembered per file in the user's
    /// folder (<see cref="ScenarioMemory"/>), so the file opens in it again.
    /// </summary>
    public string? ActiveScenario
    {
        get => activeScenario;
        set
        {
            activeScenario = value;
            if (Path is not null) ScenarioMemory.Write(userFolder, Path, value);
        }
    }

    /// <summary>What <see cref="Undo"/> would undo ("add bus B4"); null when there is nothing.</summary>
    public string? UndoName => undo.Count > 0 ? undo.Peek().What : null;

    /// <summary>What <see cref="Redo"/> would redo; null when there is nothing.</summary>
    public string? RedoName => redo.Count > 0 ? redo.Peek().What : null;

    public string RecoveryPath { get; private set; }

    /// <summary>A recovery copy newer than the file was found on open; offer it, then Accept or Discard.</summary>
    public bool RecoveryWaiting { get; private set; }

    /// <summary>Why the last recovery copy could not be written, if it could not.</summary>
    public string? RecoveryError { get; private set; }

    /// <summary>Save cannot write back to the file: untitled, the bundled demo, or an imported case.</summary>
    public bool NeedsPathToSave => Path is null || IsDemo || IsImported;

    /// <summary>A network-file name to offer when <see cref="NeedsPathToSave"/>.</summary>
    public string SuggestedSavePath
    {
        get
        {
            if (Path is null) return System.IO.Path.GetFullPath("untitled.study.json");
            string name = System.IO.Path.GetFileName(Path);
            if (IsDemo) return System.IO.Path.GetFullPath(name);
            if (IsImported) return System.IO.Path.ChangeExtension(Path, null) + ".study.json";
            return Path;
        }
    }

    /// <summary>Raised after every change of network, file or dirty state.</summary>
    public event Action? Changed;

    /// <summary>Reads a network file or an imported case; throws <see cref="InputException"/> on bad input.</summary>
    public static EditSession Open(string path, bool isDemo = false, string? userFolder = null)
    {
        Network network = NetworkFile.Read(path);
        bool imported = !File.ReadAllText(path).TrimStart('\uFEFF', ' ', '\t', '\r', '\n').StartsWith('{');
        return new EditSession(network, System.IO.Path.GetFullPath(path), isDemo, imported, userFolder ?? RecoveryFile.DefaultUserFolder);
    }

    public static EditSession Untitled(Network? network = null, string? userFolder = null) =>
        new(network ?? new Network { Name = "untitled" }, null, false, false, userFolder ?? RecoveryFile.DefaultUserFolder);

    public void Add(ElementKind kind, object element)
    {
        string id = ElementLists.Of(kind).IdOf(element);
        if (!ElementLists.IsIdFree(Network, kind, id))
            throw new ArgumentException($"id '{id}' is already used by another {ElementKinds.FamilyOf(kind).ToString().ToLowerInvariant()}");
        Apply(ElementLists.Add(Network, kind, element), $"add {ElementKinds.Label(kind)} {id}");
    }

    /// <summary>
    /// Replaces an element; renaming a bus renames every reference to it as well. An element equal to the
    /// one it replaces is no edit: nothing changes, no undo entry is made, and the result is false.
    /// </summary>
    public bool Replace(ElementKind kind, string id, object element)
    {
        object current = ElementLists.Find(Network, kind, id) ?? throw new ArgumentException($"no {ElementKinds.Label(kind)} '{id}'");
        if (current.Equals(element)) return false;
        string newId = ElementLists.Of(kind).IdOf(element);
        if (!ElementLists.IsIdFree(Network, kind, newId, except: id))
            throw new ArgumentException($"id '{newId}' is already used");
        Network next = ElementLists.Replace(Network, kind, id, element);
        if (kind == ElementKind.Bus && newId != id) next = BusReferences.Rename(next, id, newId);
        Apply(next, $"edit {ElementKinds.Label(kind)} {id}" + (newId != id ? $" (renamed {newId})" : ""));
        return true;
    }

    /// <summary>Elements that would be left dangling by deleting this element (only buses are referenced).</summary>
    public IReadOnlyList<ElementReference> ReferencesTo(ElementKind kind, string id) =>
        kind == ElementKind.Bus ? BusReferences.To(Network, id) : [];

    /// <summary>Deletes the element; a referenced bus is refused unless <paramref name="cascade"/>.</summary>
    public DeleteResult Delete(ElementKind kind, string id, bool cascade = false)
    {
        if (ElementLists.Find(Network, kind, id) is null) throw new ArgumentException($"no {ElementKinds.Label(kind)} '{id}'");
        IReadOnlyList<ElementReference> refs = ReferencesTo(kind, id);
        if (refs.Count > 0 && !cascade) return new DeleteResult(false, refs);
        Apply(refs.Count > 0 ? BusReferences.DeleteWithConnected(Network, id) : ElementLists.Remove(Network, kind, id),
            $"delete {ElementKinds.Label(kind)} {id}" + (refs.Count > 0 ? " with what is connected to it" : ""));
        return new DeleteResult(true, refs);
    }

    /// <summary>Copies the element under the next free id (id-2, id-3 ...) and returns that id.</summary>
    public string Duplicate(ElementKind kind, string id)
    {
        object element = ElementLists.Find(Network, kind, id) ?? throw new ArgumentException($"no {ElementKinds.Label(kind)} '{id}'");
        string newId = ElementLists.NextFreeId(Network, kind, id);
        Apply(ElementLists.Add(Network, kind, ElementLists.Of(kind).WithId(element, newId)), $"copy {ElementKinds.Label(kind)} {id} as {newId}");
        return newId;
    }

    /// <summary>Moves one transformer's tap to <paramref name="position"/> as one undoable edit; false when it has no tap.</summary>
    public bool SetTapPosition(string transformerId, int position)
    {
        Network n = Network;
        string what = $"set {transformerId} tap to {Study.App.Reports.Labels.Position(position)}";
        if (n.Transformers.FirstOrDefault(t => t.Id == transformerId) is { Tap: { } tap } t2)
            Apply(ElementLists.Replace(n, ElementKind.Transformer, transformerId, t2 with { Tap = tap with { Position = position } }), what);
        else if (n.ThreeWindingTransformers.FirstOrDefault(t => t.Id == transformerId) is { Tap: { } tap3 } t3)
            Apply(ElementLists.Replace(n, ElementKind.ThreeWindingTransformer, transformerId, t3 with { Tap = tap3 with { Position = position } }), what);
        else
            return false;
        return true;
    }

    /// <summary>Makes <paramref name="next"/> the current network as one undoable edit, named <paramref name="what"/> for the status line.</summary>
    public void Apply(Network next, string what = "edit")
    {
        if (ReferenceEquals(next, Network)) return;
        undo.Push((Network, what));
        redo.Clear();
        Network = next;
        AfterChange();
    }

    public bool Undo()
    {
        if (undo.Count == 0) return false;
        (Network previous, string what) = undo.Pop();
        redo.Push((Network, what));
        Network = previous;
        AfterChange();
        return true;
    }

    public bool Redo()
    {
        if (redo.Count == 0) return false;
        (Network next, string what) = redo.Pop();
        undo.Push((Network, what));
        Network = next;
        AfterChange();
        return true;
    }

    /// <summary>Writes the network back to its file (atomically). Check <see cref="NeedsPathToSave"/> first.</summary>
    public void Save()
    {
        if (NeedsPathToSave || Path is null) throw new InvalidOperationException("this network needs a file name: use Save As");
        NetworkFile.Write(Network, Path);
        saved = Network;
        RecoveryFile.Delete(RecoveryPath);
        Changed?.Invoke();
    }

    public void SaveAs(string path)
    {
        string full = System.IO.Path.GetFullPath(path);
        NetworkFile.Write(Network, full);
        RecoveryFile.Delete(RecoveryPath);
        Path = full;
        IsDemo = false;
        IsImported = false;
        RecoveryPath = RecoveryFile.PathFor(full, false, userFolder);
        saved = Network;
        ScenarioMemory.Write(userFolder, full, activeScenario);
        Changed?.Invoke();
    }

    /// <summary>Loads the waiting recovery copy as unsaved edits on top of the file (undo returns to the file).</summary>
    public void AcceptRecovery()
    {
        Network recovered = NetworkFile.Read(RecoveryPath);
        RecoveryWaiting = false;
        undo.Push((Network, "load the recovered edits"));
        Network = recovered;
        Changed?.Invoke();
    }

    public void DiscardRecovery()
    {
        RecoveryWaiting = false;
        RecoveryFile.Delete(RecoveryPath);
    }

    /// <summary>Call on a clean quit (saved, or edits discarded on purpose): the recovery copy goes.</summary>
    public void Close() => RecoveryFile.Delete(RecoveryPath);

    private void AfterChange()
    {
        if (Dirty) WriteRecovery();
        else RecoveryFile.Delete(RecoveryPath);
        Changed?.Invoke();
    }

    private void WriteRecovery()
    {
        try
        {
            // The per-user folder is the program's own: made when first needed (output never creates folders).
            if (System.IO.Path.GetDirectoryName(RecoveryPath) == userFolder) Directory.CreateDirectory(userFolder);
            NetworkFile.Write(Network, RecoveryPath);
            RecoveryError = null;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or InputException)
        {
            string fallback = RecoveryFile.PathFor(Path, true, userFolder);
            if (fallback == RecoveryPath)
            {
                RecoveryError = e.Message;
                return;
            }
            RecoveryPath = fallback;
            WriteRecovery();
        }
    }
}
