using Bramble.Arena.Spec;
using Bramble.Arena.Statistics;

namespace Bramble.Arena.Standings;

/// <summary>Where Wald's test stands for <paramref name="Candidate"/> against <paramref name="Baseline"/>.</summary>
public sealed record SprtResult(SprtSpec Spec, string Candidate, string Baseline, double Llr, SprtBounds Bounds, SprtDecision Decision, ScoreModel Model, long Samples)
{
    public string DecisionText => Decision switch
    {
        SprtDecision.AcceptH1 => $"H1 accepted: {Candidate} is at least {Spec.Elo1:0.#} Elo stronger than {Baseline} (at the test's error rates)",
        SprtDecision.AcceptH0 => $"H0 accepted: {Candidate} is not {Spec.Elo1:0.#} Elo stronger than {Baseline}; it is nearer {Spec.Elo0:0.#}",
        _ => "no decision yet",
    };
}
