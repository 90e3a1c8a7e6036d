namespace Winding.Catalogue.Validation;

/// <summary>A problem with one input field: the field's path (e.g. <c>windings[1].turns</c>) and the reason in plain words.</summary>
/// <param name="Field">Path of the field in the document, camel-case, without a leading <c>$.</c>.</param>
/// <param name="Message">Why the value is refused and what is allowed.</param>
public sealed record FieldError(string Field, string Message);
