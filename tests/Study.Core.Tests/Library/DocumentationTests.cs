// Study.Core used as a library: every public type says what it is in its XML documentation.
using System.Reflection;
using System.Xml.Linq;
using Study.Core.Cases;

namespace Study.Core.Tests.Library;

public class DocumentationTests
{
    [Fact]
    public void Every_public_type_has_a_summary()
    {
        Assembly core = typeof(StudyCase).Assembly;
        string file = Path.ChangeExtension(core.Location, ".xml");
        Assert.True(File.Exists(file), $"{file}: the documentation file is not built");
        var documented = XDocument.Load(file).Descendants("member")
            .Where(m => m.Element("summary") is { } s && s.Value.Trim().Length > 0)
            .Select(m => (string)m.Attribute("name")!)
            .ToHashSet(StringComparer.Ordinal);
        var missing = core.GetExportedTypes()
            .Where(t => !t.IsDefined(typeof(System.Runtime.CompilerServices.CompilerGeneratedAttribute)))
            .Select(t => "T:" + t.FullName!.Replace('+', '.'))
            .Where(name => !documented.Contains(name))
            .Order(StringComparer.Ordinal)
            .ToList();
        Assert.True(missing.Count == 0, "public types without a summary:\n" + string.Join("\n", missing));
    }

    [Fact]
    public void Every_study_method_of_the_case_names_the_exception_it_throws()
    {
        Assembly core = typeof(StudyCase).Assembly;
        var doc = XDocument.Load(Path.ChangeExtension(core.Location, ".xml"));
        var withException = doc.Descendants("member")
            .Where(m => m.Elements("exception").Any())
            .Select(m => ((string)m.Attribute("name")!).Split('(')[0])
            .ToHashSet(StringComparer.Ordinal);
        string[] studies = ["Open", "Of", "Solve", "Fault", "Taps", "Outages", "Profile", "Choose", "Start", "Compare"];
        var missing = studies.Where(s => !withException.Contains($"M:Study.Core.Cases.StudyCase.{s}")).ToList();
        Assert.True(missing.Count == 0, "StudyCase methods without an <exception> tag: " + string.Join(", ", missing));
    }
}
