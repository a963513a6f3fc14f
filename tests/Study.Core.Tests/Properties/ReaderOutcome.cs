// How far one input got through the pipeline: refused by the reader, invalid, refused by the build, or built.
using Study.Core.Model;
namespace Study.Core.Tests.Properties;

/// <summary>How far one input got through read, validate and build.</summary>
internal enum ReaderOutcome
{
    /// <summary>The reader refused it with a located InputException.</summary>
    Refused,
    /// <summary>Read, and validation reported errors.</summary>
    Invalid,
    /// <summary>Read and valid, and the per-unit build refused it with an InputException.</summary>
    BuildRefused,
    /// <summary>Read, valid and compiled to a per-unit model.</summary>
    Built,
}
