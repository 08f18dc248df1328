namespace PackDesigner.Core.Numerics;

/// <summary>Thrown by <see cref="RootFinder.Solve"/> when the bracket holds no sign change or the iteration does not converge.</summary>
public sealed class RootNotFoundException : Exception
{
    public RootNotFoundException(string message)
        : base(message)
    {
    }
}
