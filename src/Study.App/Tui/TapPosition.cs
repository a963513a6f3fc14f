// Setting one transformer's tap position in a network: the edit behind "apply recommended position".
using Study.Core.Model;

namespace Study.App.Tui;

/// <summary>Returns the network with the tap moved; null when the transformer or its tap is missing.</summary>
public static class TapPosition
{
    public static Network? Set(Network n, string transformerId, int position)
    {
        if (n.Transformers.FirstOrDefault(t => t.Id == transformerId) is { Tap: { } tap } t2)
            return (Network)ElementLists.Replace(n, ElementKind.Transformer, transformerId, t2 with { Tap = tap with { Position = position } });
        if (n.ThreeWindingTransformers.FirstOrDefault(t => t.Id == transformerId) is { Tap: { } tap3 } t3)
            return (Network)ElementLists.Replace(n, ElementKind.ThreeWindingTransformer, transformerId, t3 with { Tap = tap3 with { Position = position } });
        return null;
    }
}
