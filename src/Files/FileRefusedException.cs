namespace MotorLang.Files;

/// <summary>A file that the rules say not to read or write, or that could not be; the message is for the user and names the file.</summary>
public sealed class FileRefusedException(string message) : Exception(message);
