using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;
using PackDesigner.Web.Storage;

namespace PackDesigner.Web.Pages;

/// <summary>The pages' one error path: a plain message for the status; details stay in the log.</summary>
[IgnoreAntiforgeryToken]
[StorageFree]
[ResponseCache(Duration = 0, Location = ResponseCacheLocation.None, NoStore = true)]
public sealed class ErrorModel : PageModel
{
    public int Status { get; private set; }

    public string Title => Status switch
    {
        StatusCodes.Status400BadRequest => "The request could not be used",
        StatusCodes.Status404NotFound => "Page not found",
        StatusCodes.Status413PayloadTooLarge => "The request is too large",
        StatusCodes.Status503ServiceUnavailable => "Storage unavailable",
        _ when Status >= 500 => "Something went wrong",
        _ => "The request could not be completed",
    };

    public string Message => Status switch
    {
        StatusCodes.Status400BadRequest => "The form may have expired. Go back, reload the page and send it again.",
        StatusCodes.Status404NotFound => "There is no page at this address.",
        StatusCodes.Status413PayloadTooLarge => "Send less data, for example a shorter open-circuit-voltage table.",
        StatusCodes.Status503ServiceUnavailable =>
            "The design database cannot be reached just now. Nothing was saved, and nothing was half-saved. The app reconnects by itself: go back and try again in a moment.",
        _ when Status >= 500 => "An unexpected error occurred and has been logged. Please try again.",
        _ => "Please go back and try again.",
    };

    public void OnGet(int? statusCode)
    {
        Status = statusCode ?? HttpContext.Response.StatusCode;
        if (Status == StatusCodes.Status503ServiceUnavailable)
        {
            Response.Headers.RetryAfter = "10";
        }
    }

    public void OnPost(int? statusCode) => OnGet(statusCode);
}
