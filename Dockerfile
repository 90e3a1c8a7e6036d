# Winding: build with the .NET 10 SDK, run on the ASP.NET Core 10 runtime as a non-root user, with Debian's Chromium
# for the bench sheet's PDF download. Serves http on port 8080 on all interfaces inside the container; user data lives
# in the volume /data (the folder WINDING_DATA_DIR names). See README.md and DEVELOPERS.md ("PDF").

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

# The .NET 10 runtime images are Ubuntu 24.04, whose "chromium" package is only a stub for the snap (snaps do not run in
# containers). So the final stage is Debian 12, as on the machines the tests run on, with Debian's own Chromium, and
# the ASP.NET Core runtime is copied from the official runtime image (the same portable Linux build either way).
FROM mcr.microsoft.com/dotnet/aspnet:10.0 AS runtime

FROM debian:bookworm-slim AS final
# .NET's own dependencies on Debian 12, then Chromium and the DejaVu fonts the sheet is printed with.
RUN apt-get update \
    && apt-get install -y --no-install-recommends \
       ca-certificates libc6 libgcc-s1 libicu72 libssl3 libstdc++6 tzdata zlib1g \
       chromium fonts-dejavu-core \
    && rm -rf /var/lib/apt/lists/*
COPY --from=runtime /usr/share/dotnet /usr/share/dotnet
RUN ln -s /usr/share/dotnet/dotnet /usr/bin/dotnet
# The same non-root user id as the official runtime images (APP_UID 1654).
ENV APP_UID=1654 \
    DOTNET_RUNNING_IN_CONTAINER=true \
    ASPNETCORE_URLS=http://+:8080 \
    WINDING_DATA_DIR=/data \
    WINDING_CHROMIUM=/usr/bin/chromium
RUN groupadd --gid "$APP_UID" app \
    && useradd --uid "$APP_UID" --gid "$APP_UID" --create-home --shell /usr/sbin/nologin app \
    && mkdir -p /data && chown "$APP_UID" /data
WORKDIR /app
COPY --from=build /app ./
VOLUME /data
USER $APP_UID
EXPOSE 8080
ENTRYPOINT ["dotnet", "Winding.Web.dll"]
