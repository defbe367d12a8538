using SwitchTag.LanguageId.Training;
using LangIdTools;

// Usage: LangIdTools train DATA OUT [WORDLISTS] | eval DATA MODEL | bench DATA MODEL
//        LangIdTools tune DATA [WORDLISTS]  (compare word-list shares on the calibration split)
//        LangIdTools heldout DATA MODEL   (held-out means and synthetic switch F1 only, no reference)
//        LangIdTools errors DATA MODEL CODE [calibration] (held-out lines, pairs and words of CODE the
//                                           model gets wrong; of the calibration split when asked)
//        LangIdTools switch-errors DATA MODEL (synthetic calibration turns with missed switches)
//        LangIdTools speech DATA MODEL      (transcribed Spanish-English conversation, Miami dev)
//        LangIdTools tune-speech DATA MODEL (grid of the interview decoder numbers on Miami dev)
//        LangIdTools calibrate-speech DATA MODEL (fit and report the stretch confidence calibration)
if (args is ["tune", var data]) return TrainCommand.Tune(data, null);
if (args is ["tune", var ld, var lists]) return TrainCommand.Tune(ld, lists);
if (args is ["train", var trd, var tro]) return TrainCommand.Run(trd, tro, null);
if (args is ["train", var tld, var tlo, var tll]) return TrainCommand.Run(tld, tlo, tll);
if (args is ["heldout", var hd, var hm]) return HeldOutCommand.Run(hd, hm);
if (args is ["errors", var d, var m, var code]) return EvalCommand.Errors(d, m, code, Split.Evaluation);
if (args is ["errors", var ed, var em, var ecode, "calibration"]) return EvalCommand.Errors(ed, em, ecode, Split.Calibration);
if (args is ["tune-speech", var td, var tm]) return SpeechTuneCommand.Run(td, tm);
if (args is ["calibrate-speech", var cd, var cm]) return SpeechCalibrateCommand.Run(cd, cm);
if (args is ["speech", var pd, var pm]) return SpeechEvalCommand.Run(pd, pm);
if (args is ["switch-errors", var sd, var sm]) return EvalCommand.SwitchErrors(sd, sm);
if (args.Length != 3)
{
    Console.Error.WriteLine("usage: LangIdTools (train DATA OUT [WORDLISTS] | eval DATA MODEL | bench DATA MODEL)");
    return 2;
}
return args[0] switch
{
    "eval" => EvalCommand.Run(args[1], args[2]),
    "bench" => BenchCommand.Run(args[1], args[2]),
    _ => 2,
};
