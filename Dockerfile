# Winding: build with the .NET 10 SDK, run on the ASP.NET Core 10 runtime as the image's non-root user.
# Serves http on port 8080 on all interfaces inside the container; user data lives in the volume /data
# (the folder WINDING_DATA_DIR names). See README.md.

FROM mcr.microsoft.com/dotnet/sdk:10.0 AS build
WORKDIR /src
COPY global.json Directory.Build.props Directory.Packages.props .editorconfig ./
COPY src/Winding.Core/Winding.Core.csproj src/Winding.Core/
COPY src/Winding.Catalogue/Winding.Catalogue.csproj src/Winding.Catalogue/
COPY src/Winding.Web/Winding.Web.csproj src/Winding.Web/
RUN dotnet restore src/Winding.Web/Winding.Web.csproj
COPY src/ src/
COPY cores/ cores/
COPY wwwroot/ wwwroot/
# The web project copies cores/ and the top-level wwwroot/ into the published output.
RUN dotnet publish src/Winding.Web/Winding.Web.csproj -c Release -o /app --no-restore

FROM mcr.microsoft.com/dotnet/aspnet:10.0 AS final
WORKDIR /app
COPY --from=build /app ./
ENV ASPNETCORE_URLS=http://+:8080 \
    WINDING_DATA_DIR=/data
RUN mkdir -p /data && chown "$APP_UID" /data
VOLUME /data
USER $APP_UID
EXPOSE 8080
ENTRYPOINT ["dotnet", "Winding.Web.dll"]
