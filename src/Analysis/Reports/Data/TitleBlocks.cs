using MotorLang.Parser.Model;

namespace MotorLang.Analysis.Reports.Data;

/// <summary>Reads the title block from the project block.</summary>
internal static class TitleBlocks
{
    public static TitleBlock Of(MotorList model)
    {
        var project = model.Project;
        return new TitleBlock(project?.Name?.Value, project?.JobNumber?.Value, project?.Revision?.Value, project?.Dated?.Value,
            project?.PreparedBy?.Value, project?.CheckedBy?.Value);
    }
}
