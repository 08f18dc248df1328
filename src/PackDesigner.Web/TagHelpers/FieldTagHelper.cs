using Microsoft.AspNetCore.Html;
using Microsoft.AspNetCore.Mvc.Rendering;
using Microsoft.AspNetCore.Mvc.ViewFeatures;
using Microsoft.AspNetCore.Razor.TagHelpers;
using PackDesigner.Web.Pages.Designs;

namespace PackDesigner.Web.TagHelpers;

/// <summary>
/// One form field with its label, unit, hint and error messages:
/// <c>&lt;pd-field asp-for="Input.Cell.CapacityAh" unit="Ah" hint="…" /&gt;</c>. The control is a text input, or
/// with <c>kind</c> a checkbox, a select (options from <c>items</c>), a textarea, a line of free text
/// (<c>string</c>, or <c>plain</c> with spell-checking) or free-text notes (<c>notes</c>). The control is described by its hint and error, marked
/// invalid when it has errors, and shows the text as typed. Errors come from model state; the error element
/// carries <c>data-testid="error-{api path}"</c>, the path given by <c>path</c> or found by <see cref="FormFieldPaths"/>.
/// </summary>
[HtmlTargetElement("pd-field", Attributes = "asp-for")]
public sealed class FieldTagHelper : TagHelper
{
    [HtmlAttributeName("asp-for")]
    public ModelExpression For { get; set; } = null!;

    public string? Unit { get; set; }

    public string? Hint { get; set; }

    public string? Placeholder { get; set; }

    /// <summary>"text" (default, a number), "integer", "checkbox", "select", "textarea", "string" or "plain" (free text) or "notes".</summary>
    public string Kind { get; set; } = "text";

    /// <summary>The field's API path for the test ids, when <see cref="FormFieldPaths"/> does not know the field.</summary>
    public string? Path { get; set; }

    /// <summary>The most characters a free-text field takes (its <c>maxlength</c>).</summary>
    public int? MaxLength { get; set; }

    /// <summary>The options of a select.</summary>
    public IEnumerable<SelectListItem> Items { get; set; } = [];

    /// <summary>Visible lines of a textarea.</summary>
    public int Rows { get; set; } = 6;

    [ViewContext]
    [HtmlAttributeNotBound]
    public ViewContext ViewContext { get; set; } = null!;

    public override void Process(TagHelperContext context, TagHelperOutput output)
    {
        var name = ViewContext.ViewData.TemplateInfo.GetFullHtmlFieldName(For.Name);
        var id = TagBuilder.CreateSanitizedId(name, "_");
        var apiPath = Path ?? FormFieldPaths.ForFormKey(name)?.ApiPath ?? name;
        var errors = ViewContext.ModelState.TryGetValue(name, out var entry)
            ? entry.Errors.Select(e => e.ErrorMessage).ToList()
            : [];

        output.TagName = "div";
        output.TagMode = TagMode.StartTagAndEndTag;
        output.Attributes.SetAttribute("class", "field field-" + Kind + (errors.Count > 0 ? " has-error" : string.Empty));
        output.Attributes.SetAttribute("data-testid", "field-" + apiPath);

        var label = new TagBuilder("label");
        label.Attributes["for"] = id;
        label.InnerHtml.Append(For.Metadata.DisplayName ?? For.Name);

        var control = new TagBuilder("div");
        control.AddCssClass("control");
        control.InnerHtml.AppendHtml(Control(name, id, errors.Count > 0));
        if (Unit is not null)
        {
            var unit = new TagBuilder("span");
            unit.AddCssClass("unit");
            unit.InnerHtml.Append(Unit);
            control.InnerHtml.AppendHtml(unit);
        }

        var content = output.Content;
        if (Kind == "checkbox")
        {
            content.AppendHtml(control);
            content.AppendHtml(label);
        }
        else
        {
            content.AppendHtml(label);
            content.AppendHtml(control);
        }

        if (Hint is not null)
        {
            var hint = new TagBuilder("p");
            hint.AddCssClass("hint");
            hint.Attributes["id"] = id + "-hint";
            hint.InnerHtml.Append(Hint);
            content.AppendHtml(hint);
        }

        if (errors.Count > 0)
        {
            var error = new TagBuilder("div");
            error.AddCssClass("field-error");
            error.Attributes["id"] = id + "-error";
            error.Attributes["data-testid"] = "error-" + apiPath;
            foreach (var message in errors)
            {
                var p = new TagBuilder("p");
                p.InnerHtml.Append(message);
                error.InnerHtml.AppendHtml(p);
            }

            content.AppendHtml(error);
        }
    }

    private IHtmlContent Control(string name, string id, bool invalid)
    {
        var tag = Kind switch
        {
            "select" => "select",
            "textarea" or "notes" => "textarea",
            _ => "input",
        };
        var control = new TagBuilder(tag);
        control.Attributes["id"] = id;
        control.Attributes["name"] = name;
        var described = string.Join(' ', new[] { Hint is null ? null : id + "-hint", invalid ? id + "-error" : null }.OfType<string>());
        if (described.Length > 0)
        {
            control.Attributes["aria-describedby"] = described;
        }

        if (invalid)
        {
            control.Attributes["aria-invalid"] = "true";
        }

        var text = For.Model as string ?? string.Empty;
        switch (Kind)
        {
            case "checkbox":
                control.TagRenderMode = TagRenderMode.SelfClosing;
                control.Attributes["type"] = "checkbox";
                control.Attributes["value"] = "true";
                if (For.Model is true)
                {
                    control.Attributes["checked"] = "checked";
                }

                // An unchecked box posts nothing; the hidden field after it posts "false" (a checked box's "true" comes first).
                var hidden = new TagBuilder("input") { TagRenderMode = TagRenderMode.SelfClosing };
                hidden.Attributes["type"] = "hidden";
                hidden.Attributes["name"] = name;
                hidden.Attributes["value"] = "false";
                return new HtmlContentBuilder().AppendHtml(control).AppendHtml(hidden);
            case "select":
                TagBuilder? group = null;
                foreach (var item in Items)
                {
                    var option = new TagBuilder("option");
                    option.Attributes["value"] = item.Value;
                    if (string.Equals(item.Value, text, StringComparison.OrdinalIgnoreCase))
                    {
                        option.Attributes["selected"] = "selected";
                    }

                    option.InnerHtml.Append(item.Text);
                    // Items of one SelectListGroup in a row share an optgroup.
                    if (item.Group is null)
                    {
                        group = null;
                        control.InnerHtml.AppendHtml(option);
                        continue;
                    }

                    if (group is null || group.Attributes["label"] != item.Group.Name)
                    {
                        group = new TagBuilder("optgroup");
                        group.Attributes["label"] = item.Group.Name;
                        control.InnerHtml.AppendHtml(group);
                    }

                    group.InnerHtml.AppendHtml(option);
                }

                return control;
            case "textarea":
                control.Attributes["rows"] = Rows.ToString(System.Globalization.CultureInfo.InvariantCulture);
                control.Attributes["spellcheck"] = "false";
                SetPlaceholder(control);
                // A leading newline is swallowed by HTML parsers, so one is written before the text.
                control.InnerHtml.AppendHtml("\n");
                control.InnerHtml.Append(text);
                return control;
            case "notes":
                control.Attributes["rows"] = Rows.ToString(System.Globalization.CultureInfo.InvariantCulture);
                SetMaxLength(control);
                control.InnerHtml.AppendHtml("\n");
                control.InnerHtml.Append(text);
                return control;
            case "string":
                control.TagRenderMode = TagRenderMode.SelfClosing;
                control.Attributes["type"] = "text";
                control.Attributes["value"] = text;
                SetMaxLength(control);
                SetPlaceholder(control);
                return control;
            default:
                control.TagRenderMode = TagRenderMode.SelfClosing;
                control.Attributes["type"] = "text";
                if (Kind != "plain")
                {
                    control.Attributes["inputmode"] = Kind == "integer" ? "numeric" : "decimal";
                }

                control.Attributes["autocomplete"] = "off";
                control.Attributes["spellcheck"] = Kind == "plain" ? "true" : "false";
                control.Attributes["value"] = text;
                SetPlaceholder(control);
                return control;
        }
    }

    private void SetMaxLength(TagBuilder control)
    {
        if (MaxLength is { } max)
        {
            control.Attributes["maxlength"] = max.ToString(System.Globalization.CultureInfo.InvariantCulture);
        }
    }

    private void SetPlaceholder(TagBuilder control)
    {
        if (Placeholder is not null)
        {
            control.Attributes["placeholder"] = Placeholder;
        }
    }
}
