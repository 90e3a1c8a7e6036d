// Saves text as a file in the browser: a Blob behind a temporary link, clicked once. Used by the plan page's
// "Sweep CSV" button (Components/Widgets/SweepCsvButton.razor.cs), so the text crosses the circuit only on a click.
export function saveText(fileName, contentType, text) {
  const url = URL.createObjectURL(new Blob([text], { type: contentType }));
  const link = document.createElement("a");
  link.href = url;
  link.download = fileName;
  link.style.display = "none";
  document.body.appendChild(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10000);
}
