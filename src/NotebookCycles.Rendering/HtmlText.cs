using System.Text;

namespace NotebookCycles.Rendering;

/// <summary>HTML encoding of user text (titles, labels, notes): every character with a meaning in markup is escaped.</summary>
public static class HtmlText
{
    /// <summary>The text with &amp;, &lt;, &gt;, " and ' escaped; null becomes empty.</summary>
    public static string Encode(string? text)
    {
        if (string.IsNullOrEmpty(text))
        {
            return "";
        }

        int i = text.AsSpan().IndexOfAny("&<>\"'");
        if (i < 0)
        {
            return text;
        }

        var sb = new StringBuilder(text.Length + 16);
        sb.Append(text, 0, i);
        for (; i < text.Length; i++)
        {
            char c = text[i];
            switch (c)
            {
                case '&': sb.Append("&amp;"); break;
                case '<': sb.Append("&lt;"); break;
                case '>': sb.Append("&gt;"); break;
                case '"': sb.Append("&quot;"); break;
                case '\'': sb.Append("&#39;"); break;
                default: sb.Append(c); break;
            }
        }

        return sb.ToString();
    }

    internal static StringBuilder Enc(this StringBuilder sb, string? text) => sb.Append(Encode(text));
}
