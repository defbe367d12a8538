namespace SwitchTag.Tagging;

/// <summary>RulesOnly: authority lists and the gazetteer only. RulesThenModel: the model too, with
/// authority matches protected.</summary>
public enum TaggingMode { RulesOnly, RulesThenModel }
