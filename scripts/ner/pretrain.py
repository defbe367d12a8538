"""Masked-word pretraining of the tagger's tables and convolutions on unlabelled running text
(train.py --pretrain-epochs, off by default; measured in models/ner.md, Ablations).

Text: the UD sentences of ../shared/data/lid (one per line, split into words and punctuation by
WORD_RE) and the words of the NER training parts. Lid lines that share a stretch of text with any
NER dev or test sentence, or most of their words with one, are dropped first: several lid files
hold the dev and test sentences of the very treebanks UNER and NorNE annotate, and those must stay
unseen. A masked word keeps none of its ids (not even the name-list slot, which would give away
"a first name" and let the head guess without reading the context); its lower-cased form is
predicted through a softmax over the --pretrain-vocab most frequent lower-cased words by a head
that is thrown away afterwards."""
import glob
import math
import os
import random
import re
import time
from collections import Counter

import numpy as np
import torch
import torch.nn as nn

import features as fx

WORD_RE = re.compile(r"\w+(?:[-'’.]\w+)*|[^\w\s]")
MASK_ID = fx.fid("mask:")  # a feature no word produces (slot 0 of real words is "w:" + word)
# Left out: scripts the tagger does not tag (TrainedScripts in C#) and lid text without spaces between
# words (zh, ja: a line would be one "word"); pl and gl, whose lid files mix in GPL-3.0 (UD Polish-LFG)
# and LGPL-LR (UD Galician-TreeGal) sentences that the model's CC BY-SA 4.0 cannot carry.
LID_SKIP = {"ar", "el", "fa", "hi", "hy", "ja", "ka", "ko", "zh", "pl", "gl"}
NGRAM = 30  # characters of letters and digits; a lid line sharing one with a dev/test sentence is dropped
# ... as is a line of at least 3 distinct words of which this share occur in one dev/test sentence (the
# character test misses sentences whose contractions UD splits: Portuguese "das" = "de as").
WORD_SHARE = 0.7


def _squash(text):
    return "".join(c for c in fx.lower(text) if c.isalnum())


class HeldOut:
    """The NER dev and test sentences, indexed to tell whether a lid line repeats one of them."""

    def __init__(self, data):
        self.grams, self.whole, self.words, self.by_word = set(), set(), [], {}
        for split in ("dev", "test"):
            for sents in data[split].values():
                for words, _ in sents:
                    s = _squash("".join(words))
                    self.whole.add(s)
                    self.grams.update(hash(s[i:i + NGRAM]) for i in range(len(s) - NGRAM + 1))
                    ws = {_squash(w) for w in words} - {""}
                    for w in ws:
                        self.by_word.setdefault(w, []).append(len(self.words))
                    self.words.append(ws)

    def overlaps(self, line):
        s = _squash(line)
        if s in self.whole or any(hash(s[i:i + NGRAM]) in self.grams for i in range(len(s) - NGRAM + 1)):
            return True
        words = {_squash(w) for w in WORD_RE.findall(line)} - {""}
        if len(words) < 3:
            return False
        # A sentence holding WORD_SHARE of the line's words holds one of any n - need + 1 of them:
        # take the candidates from the rarest such words.
        need = math.ceil(WORD_SHARE * len(words))
        rarest = sorted(words, key=lambda w: (len(self.by_word.get(w, ())), w))[:len(words) - need + 1]
        candidates = {k for w in rarest for k in self.by_word.get(w, ())}
        return any(len(words & self.words[k]) >= need for k in candidates)


def lid_sentences(lid_dir, data, log):
    """{"lid/<lang>": [(words, None)]} with every line overlapping NER dev/test text removed."""
    held_out = HeldOut(data)
    out = {}
    for path in sorted(glob.glob(os.path.join(lid_dir, "*.txt"))):
        lang = os.path.basename(path)[:-4]
        if lang in LID_SKIP:
            continue
        kept, dropped = [], 0
        with open(path, encoding="utf-8") as fh:
            for line in fh:
                if held_out.overlaps(line):
                    dropped += 1
                    continue
                words = WORD_RE.findall(line)
                if words:
                    kept.append((words, None))
        log(f"pretraining text lid/{lang}: {len(kept)} lines kept, {dropped} dropped (shared text with NER dev/test)")
        if kept:
            out["lid/" + lang] = kept
    return out


def pretrain(args, model, feat, data, seed, log, sample_plan, draw, augment, batch_tensors):
    """Trains model (a Tagger) in place on masked-word prediction; returns the seconds taken. The
    sampling, batching and case augmentation are train.py's, passed in."""
    texts = lid_sentences(os.path.join(args.data, "lid"), data, log)
    texts.update({"ner/" + n: ss for n, ss in data["train"].items()})
    counts = Counter(fx.lower(w) for ss in texts.values() for ws, _ in ss for w in ws)
    vocab = {w: i for i, (w, _) in enumerate(sorted(counts.items(), key=lambda kv: (-kv[1], kv[0]))[:args.pretrain_vocab])}
    covered = sum(counts[w] for w in vocab) / sum(counts.values())
    log(f"pretraining: {len(texts)} texts, {sum(counts.values())} words, {len(counts)} distinct lower-cased; "
        f"the {len(vocab)} predicted cover {covered:.1%}")
    plan = sample_plan(texts, args.alpha, args.pretrain_budget, args.max_repeat, weights={})
    for n, k in sorted(plan.items()):
        log(f"pretraining sample {n}: {k} of {len(texts[n])} sentences per epoch")
    head = nn.Linear(model.norm.normalized_shape[0], len(vocab))
    tables = [model.hash.weight, model.piece.weight]
    dense = [p for p in model.parameters() if all(p is not t for t in tables)] + list(head.parameters())
    opts = [torch.optim.SparseAdam(tables, lr=2e-3), torch.optim.Adam(dense, lr=2e-3)]
    rng, nrng = random.Random(seed + 1), np.random.default_rng(seed + 1)
    steps = args.pretrain_epochs * (sum(plan.values()) // 32 + len(plan) + 1)
    scheds = [torch.optim.lr_scheduler.OneCycleLR(o, max_lr=2e-3, total_steps=steps + 10, pct_start=0.1) for o in opts]
    t0 = time.time()
    model.train(); head.train()
    for ep in range(args.pretrain_epochs):
        sample = [(augment(rng, w, args.lower_share), None) for n in sorted(texts) for w, _ in draw(rng, texts[n], plan[n])]
        sample.sort(key=lambda s: len(s[0]))
        batches = [sample[i:i + 32] for i in range(0, len(sample), 32)]
        rng.shuffle(batches)
        loss_sum = hit = seen = 0
        for bi, b in enumerate(batches):
            f, p, _ = batch_tensors(feat, b)
            target = torch.full(f.shape[:2], -1, dtype=torch.long)
            for j, (words, _) in enumerate(b):
                target[j, :len(words)] = torch.tensor([vocab.get(fx.lower(w), -1) for w in words])
            masked = (torch.from_numpy(nrng.random(f.shape[:2])) < args.mask_share) & (target >= 0)
            if not masked.any():
                continue
            f, p = f.clone(), p.clone()
            f[masked] = 0; f[:, :, 0][masked] = MASK_ID; p[masked] = 0
            logits = head(model.encode(f, p)[masked])
            loss = nn.functional.cross_entropy(logits, target[masked])
            for o in opts: o.zero_grad()
            loss.backward()
            for o, sc in zip(opts, scheds): o.step(); sc.step()
            loss_sum += loss.item()
            hit += (logits.argmax(1) == target[masked]).sum().item(); seen += int(masked.sum())
            if (bi + 1) % 1000 == 0:
                log(f"  pretraining epoch {ep + 1} batch {bi + 1}/{len(batches)} loss {loss_sum / (bi + 1):.4f} "
                    f"masked words right {hit / seen:.3f} [{time.time() - t0:.0f}s]")
        log(f"pretraining epoch {ep + 1} loss {loss_sum / len(batches):.4f} masked words right {hit / seen:.3f} "
            f"[{time.time() - t0:.0f}s]")
    return time.time() - t0
