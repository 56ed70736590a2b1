#!/usr/bin/env python3
"""Compares two weights.csv files of the same study (columns date,strategy,window,asset,weight):
prints, per strategy and window, the rebalance rows matched and the largest absolute weight
difference, and exits with status 1 when a difference exceeds the tolerance or when the two
files do not hold the same rebalances and assets. With --returns it also compares the
returns.csv files beside them (gross and net return of every held row, Method §6).

    python3 bench/peer/agree.py PEER/weights.csv PRODUCT/weights.csv [--tolerance 1e-9] [--returns]
"""

import argparse
import os
import sys
from collections import defaultdict


def fail(message):
    """Stops on bad input with the message and exit status 2, as sigmawalk does."""
    print(message, file=sys.stderr)
    sys.exit(2)


def opened(path):
    try:
        return open(path)
    except OSError as e:
        fail(f"{path}: cannot be read ({e.strerror})")


def read_paths(path, columns, entry):
    """{(strategy, window): {key: value}} from a CSV file whose header is exactly `columns`
    (date, strategy and window first); entry(cells) gives a row's (key, value)."""
    expected = ",".join(columns)
    paths = defaultdict(dict)
    with opened(path) as f:
        header = f.readline().strip()
        if header != expected:
            fail(f"{path}: header '{header}' is not {expected}")
        for number, line in enumerate(f, start=2):
            try:
                cells = line.rstrip("\n").split(",")
                if len(cells) != len(columns):
                    raise ValueError(line)
                key, value = entry(cells)
                paths[(cells[1], cells[2])][key] = value
            except ValueError:
                fail(f"{path} line {number}: '{line.strip()}' is not {expected}")
    return paths


def read_weights(path):
    """{(strategy, window): {(date, asset): weight}} with the dates of each path."""
    return read_paths(path, ("date", "strategy", "window", "asset", "weight"),
                      lambda c: ((c[0], c[3]), float(c[4])))


def read_returns(path):
    """{(strategy, window): {date: (gross, net)}}."""
    return read_paths(path, ("date", "strategy", "window", "gross_return", "net_return"),
                      lambda c: (c[0], (float(c[3]), float(c[4]))))


def compare_returns(peer_path, product_path, tolerance):
    peer = read_returns(peer_path)
    product = read_returns(product_path)
    failed = set(peer) != set(product)
    if failed:
        print(f"return paths differ: {sorted(set(peer) ^ set(product))}")
    print(f"{'strategy':<16}{'window':>8}{'rows':>12}{'gross |difference|':>22}{'net |difference|':>20}")
    for key in sorted(set(peer) & set(product), key=lambda k: (int(k[1] or 0), k[0])):
        a, b = peer[key], product[key]
        if a.keys() != b.keys():
            print(f"{key[0]} {key[1]}: the held rows differ ({len(a)} against {len(b)})")
            failed = True
        common = a.keys() & b.keys()
        gross = max((abs(a[d][0] - b[d][0]) for d in common), default=0.0)
        net = max((abs(a[d][1] - b[d][1]) for d in common), default=0.0)
        bad = max(gross, net) > tolerance
        failed |= bad
        print(f"{key[0]:<16}{key[1] or '-':>8}{len(common):>12}{gross:>22.3e}{net:>20.3e}"
              f"{'   above tolerance' if bad else ''}")
    return failed


def main(argv=None):
    p = argparse.ArgumentParser(description=__doc__.split("\n\n")[0])
    p.add_argument("peer", help="weights.csv of the numpy implementation")
    p.add_argument("product", help="weights.csv of sigmawalk on the same data and study")
    p.add_argument("--tolerance", type=float, default=1e-9, help="largest allowed |difference| (1e-9)")
    p.add_argument("--returns", action="store_true", help="also compare the returns.csv files beside them")
    args = p.parse_args(argv)
    peer = read_weights(args.peer)
    product = read_weights(args.product)
    failed = False
    if set(peer) != set(product):
        print(f"paths differ: only in {args.peer}: {sorted(set(peer) - set(product))}; "
              f"only in {args.product}: {sorted(set(product) - set(peer))}")
        failed = True
    print(f"{'strategy':<16}{'window':>8}{'rebalances':>12}{'weights':>10}{'largest |difference|':>24}")
    for key in sorted(set(peer) & set(product), key=lambda k: (int(k[1]), k[0])):
        a, b = peer[key], product[key]
        if a.keys() != b.keys():
            only_a = sorted(a.keys() - b.keys())[:3]
            only_b = sorted(b.keys() - a.keys())[:3]
            print(f"{key[0]} {key[1]}: (date, asset) rows differ, e.g. only in peer {only_a}, "
                  f"only in product {only_b}")
            failed = True
        common = a.keys() & b.keys()
        worst = max((abs(a[k] - b[k]) for k in common), default=0.0)
        dates = {d for d, _ in common}
        flag = "" if worst <= args.tolerance else "   above tolerance"
        failed |= worst > args.tolerance
        print(f"{key[0]:<16}{key[1]:>8}{len(dates):>12}{len(common):>10}{worst:>24.3e}{flag}")
    if args.returns:
        failed |= compare_returns(os.path.join(os.path.dirname(args.peer), "returns.csv"),
                                  os.path.join(os.path.dirname(args.product), "returns.csv"), args.tolerance)
    print(f"tolerance {args.tolerance:g}: {'FAILED' if failed else 'agree'}")
    return 1 if failed else 0


if __name__ == "__main__":
    sys.exit(main())
