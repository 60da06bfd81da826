#!/usr/bin/env python3
"""oilskin from a lab script, with the Python standard library only.

What it shows (each a function you can copy):
  assess_design   one assessment of a design against requirements (POST /v1/assess)
  stream_sweep    a sweep streamed as NDJSON with a progress display (POST /v1/sweep)
  sweep_to_csv    the streamed points written to a CSV file as they arrive
  fan_out         one sweep split into shards, fanned out over several service URLs
                  (concurrent.futures), merged and checked

Run it against one or more running services:
  python3 examples/python/oilskin_lab.py --url http://127.0.0.1:8080 --csv sweep.csv
  python3 examples/python/oilskin_lab.py --url http://a:8080 --url http://b:8080 --shards 8
Choose steps with --steps (default: assess,sweep,fanout). Exit 0 when every step
succeeded, 1 when a step failed, 2 for bad arguments. The service's problem
documents (RFC 9457) are printed with the fields they name.

Why only the standard library: lab machines often cannot install packages, and
urllib, json, csv and concurrent.futures cover what a script needs here.
"""

import argparse
import concurrent.futures
import csv
import json
import os
import sys
import time
import urllib.error
import urllib.request

# An invented demo design: hexadecane in 30 um grooves under a water channel.
DESIGN = {
    "texture": {"grooveWidth": "30 um", "pitch": "60 um", "grooveDepth": "15 um",
                "grooveLength": "20 mm", "grooveEnds": "open"},
    "lubricant": {"id": "n-hexadecane", "temperature": "20 degC"},
    "workingFluid": {"id": "water", "temperature": "20 degC"},
    "contactAngles": {"underWorkingFluid": {"advancing": 60, "receding": 20}},
    "flow": {"kind": "channel", "height": "2 mm", "bulkVelocity": "0.5 m/s"},
    "waterQuality": {"surfactant": {"id": "sds"}, "bulkConcentration": "0.001 mM"},
    "solid": {"thermalConductivity": "0.2 W/(m*K)", "substrateThickness": "20 um"},
    "options": {"method": "closed-form", "surfactantMethod": "scaling"},
}
REQUIREMENTS = {"minDragReduction": 0.01, "serviceTime": "2 h", "minRetainedFraction": 0.5}

# The wall shear stress over bulk velocity (log range) and channel height: 3 x 20 = 60 points.
SWEEP = {
    "calculation": "flow",
    "design": {"workingFluid": {"id": "water", "temperature": "20 degC"},
               "flow": {"kind": "channel", "height": "10 mm", "bulkVelocity": "1 m/s"}},
    "axes": [
        {"path": "flow.height", "values": ["5 mm", "10 mm", "20 mm"]},
        {"path": "flow.bulkVelocity", "range": {"from": "0.1 m/s", "to": "3 m/s", "points": 20, "spacing": "log"}},
    ],
}


class ServiceProblem(Exception):
    """A 4xx/5xx answer: the problem document's title, detail and field errors."""

    def __init__(self, url, status, problem):
        self.url, self.status, self.problem = url, status, problem
        errors = "; ".join(f"{e.get('path')}: {e.get('message')}" for e in problem.get("errors", []))
        super().__init__(f"{url}: {status} {problem.get('title', '')} {problem.get('detail', '')} {errors}".strip())


def _request(base_url, path, body, accept="application/json", api_key=None, timeout=120):
    headers = {"content-type": "application/json", "accept": accept}
    if api_key:
        headers["x-api-key"] = api_key
    url = base_url.rstrip("/") + path
    request = urllib.request.Request(url, data=json.dumps(body).encode(), headers=headers, method="POST")
    try:
        return urllib.request.urlopen(request, timeout=timeout)
    except urllib.error.HTTPError as error:
        text = error.read().decode("utf-8", "replace")
        try:
            problem = json.loads(text)
        except ValueError:
            problem = {"title": text[:200]}
        raise ServiceProblem(url, error.code, problem) from None


def post_json(base_url, path, body, **kwargs):
    with _request(base_url, path, body, **kwargs) as response:
        return json.load(response)


def assess_design(base_url, design, requirements, api_key=None):
    """One assessment: every mechanism's verdict, the overall verdict and the limiting mechanism."""
    answer = post_json(base_url, "/v1/assess", {**design, "requirements": requirements}, api_key=api_key)
    overall = answer["result"]["overall"]
    print(f"assessment: {overall['verdict']} (limiting: {overall['limitingMechanism']})")
    for name, mechanism in answer["result"]["mechanisms"].items():
        if mechanism["status"] == "assessed":
            verdict = mechanism["verdict"]
            print(f"  {name:<12} {'passes' if verdict['passes'] else 'FAILS ':<7} margin {verdict['margin']:+.3f}")
        else:
            print(f"  {name:<12} not assessed: {mechanism['reason']}")
    print(f"  inputs hash {answer['provenance']['inputsHash'][:16]}…, {len(answer['warnings'])} warnings")
    return answer


class ProgressBar:
    """A bar redrawn in place on a terminal; a line per tenth of the work in a log file."""

    def __init__(self, stream=sys.stderr, width=30):
        self.stream, self.width, self.last_tenth = stream, width, -1
        self.tty = stream.isatty()

    def update(self, done, total, failed):
        share = done / total if total else 1.0
        if self.tty:
            filled = int(share * self.width)
            self.stream.write(f"\r[{'#' * filled}{'.' * (self.width - filled)}] {done}/{total}"
                              f"{f' ({failed} failed)' if failed else ''}")
            if done >= total:
                self.stream.write("\n")
        elif int(share * 10) > self.last_tenth:
            self.last_tenth = int(share * 10)
            self.stream.write(f"progress: {done}/{total} points, {failed} failed\n")
        self.stream.flush()


def stream_sweep(base_url, sweep, on_progress=None, api_key=None):
    """Yield the lines of an NDJSON sweep as they arrive: the header first, then each point in order.

    Progress lines go to on_progress(done, total, failed); the end line is checked against the points seen.
    Closing the generator early closes the connection, which stops the sweep on the service.
    """
    seen = 0
    with _request(base_url, "/v1/sweep", sweep, accept="application/x-ndjson", api_key=api_key) as response:
        for raw in response:
            if not raw.strip():
                continue
            line = json.loads(raw)
            kind = line["kind"]
            if kind == "progress":
                if on_progress:
                    on_progress(line["done"], line["points"], line["failed"])
            elif kind == "end":
                if line["points"] != seen:
                    raise RuntimeError(f"sweep ended after {line['points']} points but {seen} arrived")
                return
            else:
                seen += kind == "point"
                yield line
    raise RuntimeError("the sweep stream ended without its end line (connection lost?)")


def sweep_to_csv(base_url, sweep, path, api_key=None):
    """Stream a sweep into a CSV file: header row with SI units, one row per point, an error column."""
    bar = ProgressBar()
    rows = failed = 0
    partial = path + ".partial"
    with open(partial, "w", newline="", encoding="utf-8") as out:
        writer = None
        for line in stream_sweep(base_url, sweep, on_progress=bar.update, api_key=api_key):
            if line["kind"] == "sweep":
                columns = [c["name"] for c in line["columns"]]
                units = {c["name"]: c["unit"] for c in line["columns"]}
                writer = csv.writer(out)
                writer.writerow(["index"] + [f"{n} ({units[n]})" if units[n] else n for n in columns] + ["error"])
                continue
            problem = line.get("problem")
            failed += problem is not None
            writer.writerow([line["index"]] + [line["values"].get(n) for n in columns]
                            + [problem["title"] if problem else ""])
            rows += 1
    os.replace(partial, path)  # a reader never sees half a file
    print(f"sweep: {rows} points ({failed} failed) written to {path}")
    return rows


def fan_out(urls, sweep, shards, api_key=None):
    """Split one sweep into `shards` contiguous slices, run them over the URLs in parallel, merge and check.

    Slices concatenated in shard order equal the whole sweep (the service's sharding contract), so the merge
    is a concatenation; the checks catch a lost or foreign shard.
    """
    def run(index):
        url = urls[index % len(urls)]
        answer = post_json(url, "/v1/sweep", {**sweep, "shard": {"index": index, "count": shards}}, api_key=api_key)
        return index, url, answer

    started = time.monotonic()
    with concurrent.futures.ThreadPoolExecutor(max_workers=min(shards, 4 * len(urls))) as pool:
        results = sorted(pool.map(run, range(shards)), key=lambda r: r[0])
    sweep_ids = {answer["sweepId"] for _, _, answer in results}
    if len(sweep_ids) != 1:
        raise RuntimeError(f"shards belong to different sweeps: {sorted(sweep_ids)}")
    points = [point for _, _, answer in results for point in answer["points"]]
    total = results[0][2]["totalPoints"]
    if [p["index"] for p in points] != list(range(total)):
        raise RuntimeError(f"merged shards do not cover points 0..{total - 1} exactly once, in order")
    per_url = {url: sum(1 for _, u, _ in results if u == url) for url in urls}
    print(f"fan-out: {total} points in {shards} shards over {len(urls)} services "
          f"({', '.join(f'{n} on {u}' for u, n in per_url.items())}) in {time.monotonic() - started:.2f} s")
    return points


def main(argv=None):
    parser = argparse.ArgumentParser(description="oilskin from a lab script (standard library only)")
    parser.add_argument("--url", action="append", help="a service URL; repeat for fan-out (default http://127.0.0.1:8080)")
    parser.add_argument("--steps", default="assess,sweep,fanout", help="comma-separated: assess, sweep, fanout")
    parser.add_argument("--csv", default="oilskin-sweep.csv", help="where the streamed sweep is written")
    parser.add_argument("--shards", type=int, default=6, help="shards of the fanned-out sweep")
    parser.add_argument("--api-key", default=os.environ.get("OILSKIN_API_KEY"), help="x-api-key (or OILSKIN_API_KEY)")
    args = parser.parse_args(argv)
    urls = args.url or ["http://127.0.0.1:8080"]
    steps = [s.strip() for s in args.steps.split(",") if s.strip()]
    unknown = set(steps) - {"assess", "sweep", "fanout"}
    if unknown or args.shards < 1:
        parser.error(f"unknown steps {sorted(unknown)}" if unknown else "--shards must be at least 1")

    failures = 0
    for step in steps:
        try:
            if step == "assess":
                assess_design(urls[0], DESIGN, REQUIREMENTS, api_key=args.api_key)
            elif step == "sweep":
                sweep_to_csv(urls[0], SWEEP, args.csv, api_key=args.api_key)
            else:
                fan_out(urls, SWEEP, args.shards, api_key=args.api_key)
        except (ServiceProblem, RuntimeError, OSError) as error:
            failures += 1
            print(f"{step} failed: {error}", file=sys.stderr)
    return 1 if failures else 0


if __name__ == "__main__":
    sys.exit(main())
