namespace Winding.Web.Sheets;

/// <summary>One file the sheet page's exports row saves in the browser.</summary>
/// <param name="FileName">The file name (<see cref="Exports.ExportFileName"/>).</param>
/// <param name="ContentType">The media type.</param>
/// <param name="Text">The file's text.</param>
public sealed record SheetDownload(string FileName, string ContentType, string Text);
