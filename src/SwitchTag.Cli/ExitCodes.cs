namespace SwitchTag.Cli;

public static class ExitCodes
{
    public const int Success = 0;
    public const int InputsRejected = 1;
    public const int Usage = 2;
}
