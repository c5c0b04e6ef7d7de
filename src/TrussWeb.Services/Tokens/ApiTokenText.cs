using System.Security.Cryptography;
using System.Text;

namespace TrussWeb.Services.Tokens;

/// <summary>
/// Token text: "tw_" + 9 random characters (the non-secret prefix that finds the row) + "_" + 43 random
/// characters (256 bits). Only the SHA-256 of the whole text is stored.
/// </summary>
public static class ApiTokenText
{
    /// <summary>Start of every token text.</summary>
    public const string Marker = "tw_";

    private const string Alphabet = "abcdefghijkmnopqrstuvwxyzABCDEFGHJKLMNPQRSTUVWXYZ23456789";

    /// <summary>A new random token text.</summary>
    public static string Generate() => Marker + Random(9) + "_" + Random(43);

    /// <summary>The prefix of a well-formed token text; null when the text cannot be a token.</summary>
    public static string? PrefixOf(string? token)
    {
        if (token is null || token.Length != Marker.Length + 9 + 1 + 43 || !token.StartsWith(Marker, StringComparison.Ordinal) || token[Marker.Length + 9] != '_')
        {
            return null;
        }

        return token[..(Marker.Length + 9)];
    }

    /// <summary>Lower-case hex SHA-256 of the UTF-8 text.</summary>
    public static string Hash(string token) => Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(token)));

    private static string Random(int length)
    {
        var chars = new char[length];
        for (var i = 0; i < length; i++)
        {
            chars[i] = Alphabet[RandomNumberGenerator.GetInt32(Alphabet.Length)];
        }

        return new string(chars);
    }
}
