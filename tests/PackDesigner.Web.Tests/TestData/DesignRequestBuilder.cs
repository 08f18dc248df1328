using System.Text.Json;
using System.Text.Json.Nodes;
using System.Text.Json.Serialization;
using PackDesigner.Core.Cells;
using PackDesigner.Core.Design;
using PackDesigner.Web.Api;

namespace PackDesigner.Web.Tests.TestData;

/// <summary>
/// Test data for the evaluate endpoint: a valid default design with <c>With…</c> overrides. The default is a
/// plain 16S1P LFP pack for a 48 V system (common-practice LFP figures, every figure entered) that raises no
/// error finding, so that each finding test changes exactly what triggers its finding.
/// </summary>
public sealed class DesignRequestBuilder
{
    /// <summary>Serializes requests the way a client would: camelCase, enums as strings, omitted members left out.</summary>
    public static readonly JsonSerializerOptions Json = CreateJson();

    private EvaluateRequest _request;

    private DesignRequestBuilder(EvaluateRequest request) => _request = request;

    public static DesignRequestBuilder Valid() => new(new EvaluateRequest
    {
        Cell = new CellRequest
        {
            Chemistry = Chemistry.Lfp,
            CapacityAh = 100,
            NominalVoltage = 3.2,
            MaxChargeVoltage = 3.65,
            MinDischargeVoltage = 2.5,
            MaxChargeCurrentA = 50,
            MaxDischargeCurrentA = 100,
            PeakDischargeCurrentA = 200,
            PeakDischargeDurationS = 10,
            InternalResistanceMilliohm = 0.6,
            MassKg = 2.0,
            CapacityTolerancePercent = 3,
            ChargeTemperatureMinC = 0,
            ChargeTemperatureMaxC = 45,
            DischargeTemperatureMinC = -20,
            DischargeTemperatureMaxC = 60,
        },
        Series = 16,
        Parallel = 1,
        LinkResistanceMilliohm = 0.1,
        Balancing = BalancingMethod.Bottom,
        SocWindow = new SocWindowRequest { MinPercent = 10, MaxPercent = 90 },
        Controller = new ControllerRequest
        {
            MinVoltage = 46,
            MaxVoltage = 60,
            ContinuousCurrentA = 80,
            PeakCurrentA = 150,
            PeakDurationS = 10,
            RegenCurrentA = 20,
            DcLinkCapacitanceMicrofarad = 1000,
            PrechargeTimeS = 1,
        },
        Charger = new ChargerRequest { MaxVoltage = 58.4, MaxCurrentA = 30, VoltageStepV = 0.01, FloatStage = false },
        Ambient = new AmbientRequest { MinC = 5, MaxC = 35 },
    });

    /// <summary>The request describing a Core design as it is (used to send the demo design through the API).</summary>
    public static DesignRequestBuilder From(DesignInput design) => new(DesignRequestMapper.ToRequest(design));

    public DesignRequestBuilder WithCell(Func<CellRequest, CellRequest> change) => Set(r => r with { Cell = change(r.Cell!) });

    public DesignRequestBuilder WithOcvCurve(params (double? SocPercent, double? Voltage)[] rows) =>
        WithCell(c => c with { OcvCurve = rows.Select(p => (OcvPointRequest?)new OcvPointRequest { SocPercent = p.SocPercent, Voltage = p.Voltage }).ToList() });

    public DesignRequestBuilder WithSeries(int? series) => Set(r => r with { Series = series });

    public DesignRequestBuilder WithParallel(int? parallel) => Set(r => r with { Parallel = parallel });

    public DesignRequestBuilder WithSocWindow(double? minPercent, double? maxPercent) =>
        Set(r => r with { SocWindow = new SocWindowRequest { MinPercent = minPercent, MaxPercent = maxPercent } });

    public DesignRequestBuilder WithController(Func<ControllerRequest, ControllerRequest> change) => Set(r => r with { Controller = change(r.Controller!) });

    public DesignRequestBuilder WithoutController() => Set(r => r with { Controller = null });

    public DesignRequestBuilder WithCharger(Func<ChargerRequest, ChargerRequest> change) => Set(r => r with { Charger = change(r.Charger!) });

    public DesignRequestBuilder WithAmbient(double? minC, double? maxC) => Set(r => r with { Ambient = new AmbientRequest { MinC = minC, MaxC = maxC } });

    public DesignRequestBuilder WithMargins(MarginsRequest margins) => Set(r => r with { Margins = margins });

    public DesignRequestBuilder WithCable(double? crossSectionMm2, double? lengthM) =>
        Set(r => r with { Cable = new CableRequest { CrossSectionMm2 = crossSectionMm2, LengthM = lengthM } });

    public EvaluateRequest Build() => _request;

    /// <summary>The request as a JSON tree, for changes a typed request cannot express (unknown members, wrong types).</summary>
    public JsonObject ToJsonObject() => JsonSerializer.SerializeToNode(_request, Json)!.AsObject();

    public string ToJson() => JsonSerializer.Serialize(_request, Json);

    private DesignRequestBuilder Set(Func<EvaluateRequest, EvaluateRequest> change)
    {
        _request = change(_request);
        return this;
    }

    private static JsonSerializerOptions CreateJson()
    {
        var options = new JsonSerializerOptions(JsonSerializerDefaults.Web) { DefaultIgnoreCondition = JsonIgnoreCondition.WhenWritingNull };
        ApiJson.Configure(options);
        return options;
    }
}
