using System.Text.Json;

namespace Winding.Web.Api;

/// <summary>JSON settings of API responses: camel-case names, invariant numbers.</summary>
public static class ApiJson
{
    /// <summary>Response serialisation options.</summary>
    public static JsonSerializerOptions Options { get; } = new(JsonSerializerDefaults.Web)
    {
        Converters = { new System.Text.Json.Serialization.JsonStringEnumConverter(JsonNamingPolicy.KebabCaseLower) },
    };
}
