// One random edit of an input text, as plain numbers so that CsCheck can shrink it.
namespace Study.Core.Tests.Properties;

/// <summary>
/// An edit: <see cref="Kind"/> chooses what to do, <see cref="Where"/> where (taken modulo the text's
/// size), <see cref="What"/> and <see cref="Extra"/> which token or how much. Small numbers are simple
/// edits near the start, so shrinking moves toward them.
/// </summary>
internal readonly record struct MutationStep(int Kind, int Where, int What, int Extra)
{
    public override string ToString() => $"({Kind},{Where},{What},{Extra})";
}
