using System.Net;
using System.Net.Sockets;

namespace PackDesigner.Web.Tests.Infrastructure;

/// <summary>
/// A TCP relay on 127.0.0.1 in front of a database server, to take the database away from a running app and give
/// it back: <see cref="Cut"/> closes every relayed connection and refuses new ones (as a stopped server does);
/// <see cref="Restore"/> listens again on the same port. The server itself keeps running for the other tests.
/// </summary>
public sealed class TcpRelay : IDisposable
{
    private readonly string _targetHost;
    private readonly int _targetPort;
    private readonly List<TcpClient> _open = [];
    private readonly Lock _gate = new();
    private TcpListener? _listener;

    public TcpRelay(string targetHost, int targetPort)
    {
        _targetHost = targetHost;
        _targetPort = targetPort;
        var probe = new TcpListener(IPAddress.Loopback, 0);
        probe.Start();
        Port = ((IPEndPoint)probe.LocalEndpoint).Port;
        probe.Stop();
        Restore();
    }

    public int Port { get; }

    public bool IsCut => _listener is null;

    /// <summary>Stops listening and closes every relayed connection.</summary>
    public void Cut()
    {
        lock (_gate)
        {
            _listener?.Stop();
            _listener = null;
            foreach (var client in _open)
            {
                client.Close();
            }

            _open.Clear();
        }
    }

    /// <summary>Listens again on <see cref="Port"/>.</summary>
    public void Restore()
    {
        lock (_gate)
        {
            if (_listener is not null)
            {
                return;
            }

            var listener = new TcpListener(IPAddress.Loopback, Port);
            listener.Server.SetSocketOption(SocketOptionLevel.Socket, SocketOptionName.ReuseAddress, true);
            listener.Start();
            _listener = listener;
            _ = AcceptAsync(listener);
        }
    }

    private async Task AcceptAsync(TcpListener listener)
    {
        while (true)
        {
            TcpClient inbound;
            try
            {
                inbound = await listener.AcceptTcpClientAsync();
            }
            catch (Exception ex) when (ex is SocketException or ObjectDisposedException or InvalidOperationException)
            {
                return;
            }

            _ = RelayAsync(inbound);
        }
    }

    private async Task RelayAsync(TcpClient inbound)
    {
        var outbound = new TcpClient();
        lock (_gate)
        {
            _open.Add(inbound);
            _open.Add(outbound);
        }

        try
        {
            await outbound.ConnectAsync(_targetHost, _targetPort);
            var a = inbound.GetStream();
            var b = outbound.GetStream();
            await Task.WhenAny(a.CopyToAsync(b), b.CopyToAsync(a));
        }
        catch (Exception ex) when (ex is IOException or SocketException or ObjectDisposedException or InvalidOperationException)
        {
            // A cut connection ends here.
        }
        finally
        {
            inbound.Close();
            outbound.Close();
            lock (_gate)
            {
                _open.Remove(inbound);
                _open.Remove(outbound);
            }
        }
    }

    public void Dispose() => Cut();
}
