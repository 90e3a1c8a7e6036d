// Saves a file in the browser: a Blob behind a temporary link, clicked once. saveText is used by the plan page's
// "Sweep CSV" button (Components/Widgets/SweepCsvButton.razor.cs) and the sheet page's exports row, so the text crosses
// the circuit only on a click; saveBytes takes a .NET stream reference (DotNetStreamReference), used for the sheet's PDF.
function saveBlob(fileName, blob) {
  const url = URL.createObjectURL(blob);
  const link = document.createElement("a");
  link.href = url;
  link.download = fileName;
  link.style.display = "none";
  document.body.appendChild(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10000);
}

export function saveText(fileName, contentType, text) {
  saveBlob(fileName, new Blob([text], { type: contentType }));
}

export async function saveBytes(fileName, contentType, streamReference) {
  const bytes = await streamReference.arrayBuffer();
  saveBlob(fileName, new Blob([bytes], { type: contentType }));
}
