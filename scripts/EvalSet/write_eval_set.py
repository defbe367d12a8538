#!/usr/bin/env python3
"""Renders the evaluation interviews of interviews.py into transcripts-eval/ (WebVTT, SRT, timestamped
text, Markdown) and their gold into tests/SwitchTag.Pipeline.Tests/EvalGold/, checking that every gold
surface and worklist text occurs in the plain talk. Deterministic; run once when the set was frozen."""
import json
import os
import re
import sys

sys.path.insert(0, os.path.dirname(__file__))
from interviews import INTERVIEWS  # noqa: E402

ROOT = os.path.abspath(os.path.join(os.path.dirname(__file__), "..", ".."))
WORDS_PER_SECOND = 2.43
TURN_GAP = 0.6
KEEP = "\x01"
STRETCH = re.compile(r"\{([a-z]{2}):([^{}]*)\}")


def parse_talk(interview):
    turns = []
    for line in interview["talk"].strip().splitlines():
        key, text = line.split(": ", 1)
        worklist = [{"language": m.group(1), "text": m.group(2)} for m in STRETCH.finditer(text)]
        # Spaces inside a stretch or a gold surface are held by KEEP while the talk is cut into cues
        # and lines, so no line break splits them and their gold text stays verbatim.
        plain = STRETCH.sub(lambda m: m.group(2).replace(" ", KEEP), text)
        for surface in (s for h in interview["headings"] for s in h["surfaces"] if " " in s):
            plain = plain.replace(surface, surface.replace(" ", KEEP))
        turns.append((interview["speakers"][key], plain, worklist))
    return turns


def cues_of(text, max_words=14):
    """Sentences packed into cues of at most max_words words; a longer sentence is cut at a comma or
    at max_words."""
    cues = []
    for sentence in re.split(r"(?<=[.!?])\s+", text):
        words = sentence.split()
        while words:
            if len(words) <= max_words:
                piece, words = words, []
            else:
                cut = max((i + 1 for i, w in enumerate(words[:max_words]) if w.endswith(",")), default=max_words)
                piece, words = words[:cut], words[cut:]
            if cues and len(cues[-1].split()) + len(piece) <= max_words // 2 + 2:
                cues[-1] += " " + " ".join(piece)
            else:
                cues.append(" ".join(piece))
    return cues


def timed(turns):
    """(speaker, turn index, cue text, start, end) with talk at WORDS_PER_SECOND and a gap between turns."""
    t = 2.0
    out = []
    for i, (speaker, text, _) in enumerate(turns):
        for cue in cues_of(text):
            d = len(cue.replace(KEEP, " ").split()) / WORDS_PER_SECOND
            out.append((speaker, i, cue, t, t + d))
            t += d + 0.08
        t += TURN_GAP
    return out


def ts(seconds, sep="."):
    ms = int(round(seconds * 1000))
    h, ms = divmod(ms, 3600000)
    m, ms = divmod(ms, 60000)
    s, ms = divmod(ms, 1000)
    return f"{h:02}:{m:02}:{s:02}{sep}{ms:03}"


def hms(seconds):
    return ts(seconds)[:8]


def wrap(text, width):
    lines, line = [], ""
    for w in text.split():
        if line and len(line) + 1 + len(w) > width:
            lines.append(line)
            line = w
        else:
            line = f"{line} {w}" if line else w
    return lines + [line]


def render_vtt(interview, turns):
    out = ["WEBVTT", "", "NOTE", *wrap(interview["note"], 95), ""]
    for speaker, _, cue, a, b in timed(turns):
        out += [f"{ts(a)} --> {ts(b)}", f"<v {speaker}>{cue}", ""]
    return "\n".join(out)


def render_srt(interview, turns):
    out = []
    last = None
    for n, (speaker, _, cue, a, b) in enumerate(timed(turns), 1):
        text = f"{speaker}: {cue}" if speaker != last else cue
        last = speaker
        words = text.split()
        lines = [text] if len(words) <= 8 else [" ".join(words[:len(words) // 2]), " ".join(words[len(words) // 2:])]
        out += [str(n), f"{ts(a, ',')} --> {ts(b, ',')}", *lines, ""]
    return "\n".join(out)


def turn_starts(turns):
    starts = {}
    for _, i, _, a, _ in timed(turns):
        starts.setdefault(i, a)
    return starts


def render_txt(interview, turns):
    starts = turn_starts(turns)
    out = []
    for i, (speaker, text, _) in enumerate(turns):
        lines = wrap(f"[{hms(starts[i])}] {speaker}: {text}", 100)
        out += lines
    return "\n".join(out) + "\n"


def render_md(interview, turns):
    starts = turn_starts(turns)
    out = [f"# {interview['title']}", ""]
    for i, (speaker, text, _) in enumerate(turns):
        if i in interview["sections"]:
            out += [f"## {interview['sections'][i]}", ""]
        out += [f"**[{hms(starts[i])}] {speaker}:** {text}", ""]
    return "\n".join(out)


RENDER = {"vtt": render_vtt, "srt": render_srt, "txt": render_txt, "md": render_md}


def occurs(surface, text):
    return re.search(r"(?<!\w)" + re.escape(surface) + r"(?!\w)", text) is not None


def check(interview, turns):
    talk = "\n".join(t.replace(KEEP, " ") for _, t, _ in turns)
    problems = []
    seen = {}
    for h in interview["headings"]:
        for s in h["surfaces"]:
            if not occurs(s, talk):
                problems.append(f"{interview['name']}: surface {s!r} of {h['name']} not in the talk")
            key = (h["label"], s.casefold())
            if key in seen and seen[key] != h["name"]:
                problems.append(f"{interview['name']}: surface {s!r} in {seen[key]} and {h['name']}")
            seen[key] = h["name"]
        for s in h.get("merge", {}):
            if s not in h["surfaces"]:
                problems.append(f"{interview['name']}: merge note for {s!r} not among the surfaces of {h['name']}")
    return problems


def main():
    problems = []
    for interview in INTERVIEWS:
        turns = parse_talk(interview)
        problems += check(interview, turns)
        path = os.path.join(ROOT, "transcripts-eval", f"{interview['name']}.{interview['format']}")
        with open(path, "w", encoding="utf-8", newline="\n") as f:
            f.write(RENDER[interview["format"]](interview, turns).replace(KEEP, " "))
        gold = {
            "interview": interview["name"],
            "mainLanguage": interview["main"],
            "headings": interview["headings"],
            "worklist": [w for _, _, work in turns for w in work],
        }
        gpath = os.path.join(ROOT, "tests", "SwitchTag.Indexing.Tests", "EvalGold", f"{interview['name']}.gold.json")
        os.makedirs(os.path.dirname(gpath), exist_ok=True)
        with open(gpath, "w", encoding="utf-8", newline="\n") as f:
            json.dump(gold, f, ensure_ascii=False, indent=2)
            f.write("\n")
        words = sum(len(t.replace(KEEP, " ").split()) for _, t, _ in turns)
        print(f"{interview['name']}.{interview['format']}: {len(turns)} turns, {words} words, "
              f"{len(interview['headings'])} headings, {len(gold['worklist'])} stretches")
    for p in problems:
        print("PROBLEM", p, file=sys.stderr)
    return 1 if problems else 0


if __name__ == "__main__":
    sys.exit(main())
