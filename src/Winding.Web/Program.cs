using Winding.Web.Hosting;

var builder = WebApplication.CreateBuilder(args);
builder.WebHost.UseStaticWebAssets();
builder.UseDefaultAddress();
builder.Services.AddWinding(builder.Configuration);
builder.Services.AddWindingPdfPrinting(builder.Configuration);

var app = builder.Build();
app.UseWinding();
app.Run();
