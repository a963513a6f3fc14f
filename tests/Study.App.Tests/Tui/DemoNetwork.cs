// The bundled demo network, as copied next to the tests, for studies that need a real case.
using Study.Core.Io;
using Study.Core.Model;

namespace Study.App.Tests.Tui;

public static class DemoNetwork
{
    public static string PathOf => Path.Combine(AppContext.BaseDirectory, "networks", "harbour-estate.study.json");

    public static Network Read() => NetworkFile.Read(PathOf);
}
