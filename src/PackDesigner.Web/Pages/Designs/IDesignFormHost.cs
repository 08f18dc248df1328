namespace PackDesigner.Web.Pages.Designs;

/// <summary>A page that shows the design's input sections (<c>_DesignFields</c>): the form model bound as <c>Input</c>.</summary>
public interface IDesignFormHost
{
    DesignForm Input { get; }

    /// <summary>The margins start folded away, unless one of them needs correcting.</summary>
    bool MarginsOpen { get; }
}
