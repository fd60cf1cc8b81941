using System.Globalization;
using Bramble.Arena.Spec;
using Bramble.Arena.Statistics;

namespace Bramble.Arena.Standings;

/// <summary>Where Wald's test stands for <paramref name="Candidate"/> against <paramref name="Baseline"/>.</summary>
public sealed record SprtResult(SprtSpec Spec, string Candidate, string Baseline, double Llr, SprtBounds Bounds, SprtDecision Decision, ScoreModel Model, long Samples)
{
    public string DecisionText => Decision switch
    {
        SprtDecision.Alternative => string.Create(CultureInfo.InvariantCulture,
            $"the test chose the alternative, Δ = {Spec.AlternativeElo:0.#} Elo for {Candidate} over {Baseline} rather than {Spec.NullElo:0.#}, at error rates alpha {Spec.Alpha}, beta {Spec.Beta}"),
        SprtDecision.Null => string.Create(CultureInfo.InvariantCulture,
            $"the test chose the null hypothesis, Δ = {Spec.NullElo:0.#} Elo for {Candidate} over {Baseline} rather than {Spec.AlternativeElo:0.#}, at error rates alpha {Spec.Alpha}, beta {Spec.Beta}"),
        _ => "no decision yet",
    };
}
