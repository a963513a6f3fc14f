// Writes a sparse matrix in the Matrix Market coordinate format (NIST), for diagnosis in other tools.
using System.Globalization;
using System.Text;
using Study.Core.Io;
using Study.Core.Numerics;

namespace Study.App.Cli.Solve;

public static class MatrixMarket
{
    /// <summary>"%%MatrixMarket matrix coordinate real general", 1-based indices, one entry a line.</summary>
    public static string Format(CscMatrix<double> a, string? comment = null)
    {
        var sb = new StringBuilder();
        sb.Append("%%MatrixMarket matrix coordinate real general\n");
        if (comment is not null)
            foreach (string line in comment.Split('\n')) sb.Append("% ").Append(line).Append('\n');
        sb.Append(CultureInfo.InvariantCulture, $"{a.Rows} {a.Cols} {a.NonZeros}\n");
        for (int j = 0; j < a.Cols; j++)
            for (int p = a.ColPtr[j]; p < a.ColPtr[j + 1]; p++)
                sb.Append(CultureInfo.InvariantCulture, $"{a.RowIdx[p] + 1} {j + 1} {a.Values[p]:R}\n");
        return sb.ToString();
    }

    public static void Write(CscMatrix<double> a, string path, string? comment = null) =>
        AtomicFile.WriteAllText(path, Format(a, comment));
}
