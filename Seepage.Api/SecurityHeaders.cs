namespace Seepage.Api;

/// <summary>Security headers on every response (page, API, reports, Swagger UI, errors): a content security policy for a
/// page that loads nothing from elsewhere (scripts only from this origin; inline styles for the memo's stylesheet and the
/// Swagger UI; data: and blob: images for icons and the PNG export), no MIME sniffing, no framing, no referrer.</summary>
public static class SecurityHeaders
{
    public const string ContentSecurityPolicy =
        "default-src 'self'; script-src 'self'; style-src 'self' 'unsafe-inline'; img-src 'self' data: blob:; font-src 'self' data:; " +
        "connect-src 'self'; object-src 'none'; base-uri 'none'; frame-ancestors 'none'; form-action 'self'";

    public static void UseSeepageSecurityHeaders(this WebApplication app) =>
        app.Use(async (context, next) =>
        {
            context.Response.OnStarting(() =>
            {
                var headers = context.Response.Headers;
                headers.ContentSecurityPolicy = ContentSecurityPolicy;
                headers.XContentTypeOptions = "nosniff";
                headers.XFrameOptions = "DENY";
                headers["Referrer-Policy"] = "no-referrer";
                headers["Cross-Origin-Opener-Policy"] = "same-origin";
                return Task.CompletedTask;
            });
            await next(context);
        });
}
