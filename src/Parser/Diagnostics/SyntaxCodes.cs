namespace MotorLang.Parser.Diagnostics;

/// <summary>
/// Stable codes for problems the parser and model builder find. Never renumber: users suppress
/// and search by these. Each is documented in docs/format.md#diagnostics.
/// </summary>
public static class SyntaxCodes
{
    public const string UnknownKeyword = "P001";
    public const string MissingValue = "P002";
    public const string BadUnit = "P003";
    public const string BadNumber = "P004";
    public const string BadIndentation = "P005";
    public const string TabIndentation = "P006";
    public const string UnterminatedString = "P007";
    public const string UnknownWireSize = "P008";
    public const string OutOfRange = "P009";
    public const string UnexpectedValue = "P010";
    public const string MergeConflict = "P011";
    public const string MisplacedStatement = "P012";
    public const string DuplicateTag = "P013";
    public const string UnknownReference = "P014";
    public const string DuplicateSetting = "P015";
    public const string ReferenceCycle = "P016";
    public const string BadTag = "P017";
    public const string FileTooLarge = "P018";
    public const string BinaryContent = "P019";
    public const string DuplicateProject = "P020";
    public const string MoreOnLine = "P027";
    /// <summary>A 'source' missing a value its kind needs, or given one its kind does not take.</summary>
    public const string SourceValues = "P035";
    public const string CapacitorRating = "P045";
}
