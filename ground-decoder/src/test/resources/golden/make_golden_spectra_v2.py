#!/usr/bin/env python3
"""Builds the layout-2 golden spectrum packets and frames of GoldenSpectraV2.java by hand from the
telemetry ICD section 4 (layout 2: 0x82, instrument id, sample width w; w-bit samples raw in ceil(w/8)
octets or CCSDS 121 with n = w) and the instrument descriptions (demo-cup.yaml id 1 w 16, fine-cup.yaml
id 2 w 20). Independent of the Java code.

The CCSDS 121 stream is coded here from standards.md (preprocessor, split-sample / fundamental sequence /
no compression per block, no zero-block runs or second extension), and, where the aec tool of Debian's
libaec-tools is on the PATH, decoded again with it to the samples put in (aec -d -n 20 -j 8 -r 32 -m -3).
Run: python3 make_golden_spectra_v2.py   (prints one hex string per packet and the frame stream)
"""
import binascii
import datetime
import os
import shutil
import struct
import subprocess
import tempfile

T2026 = (datetime.date(2026, 1, 1) - datetime.date(1958, 1, 1)).days * 86400  # TAI seconds


def packet(apid, seq, data_field, sec_hdr=True):  # ICD 3.1
    w0 = ((1 if sec_hdr else 0) << 11) | apid
    w1 = (0b11 << 14) | seq
    return struct.pack('>HHH', w0, w1, len(data_field) - 1) + data_field


def cuc(coarse, fine):  # ICD 3.2
    return struct.pack('>IH', coarse, fine)


def tags(gains):  # ICD 4: 2 bits per window, first window in the two MSBs
    out = bytearray((len(gains) + 3) // 4)
    for i, g in enumerate(gains):
        out[i // 4] |= g << (6 - 2 * (i % 4))
    return bytes(out)


def flags(sat):  # ICD 4: 1 bit per window, MSB first
    out = bytearray((len(sat) + 7) // 8)
    for i, s in enumerate(sat):
        if s:
            out[i // 8] |= 0x80 >> (i % 8)
    return bytes(out)


def raw(samples, w):  # ICD 4 compression 0x00: each sample big-endian in ceil(w/8) octets
    n = (w + 7) // 8
    return b''.join(x.to_bytes(n, 'big') for x in samples)


class Bits:
    def __init__(self):
        self.bits = []

    def put(self, value, n):
        self.bits += [(value >> (n - 1 - i)) & 1 for i in range(n)]

    def fs(self, m):  # FS(m): m zeros then a one
        self.bits += [0] * m + [1]

    def octets(self):  # zero-filled to an octet (ICD 4)
        b = self.bits + [0] * (-len(self.bits) % 8)
        return bytes(int(''.join(map(str, b[i:i + 8])), 2) for i in range(0, len(b), 8))


def rice(samples, n, J=8):  # ICD 4 compression 0x01, n = w, J = 8, one reference interval
    padded = samples + [samples[-1]] * (-len(samples) % J)  # padded by repeating the last sample
    xmax = (1 << n) - 1
    mapped = [0]
    for i in range(1, len(padded)):  # standards.md mapper
        prev, d = padded[i - 1], padded[i] - padded[i - 1]
        theta = min(prev, xmax - prev)
        mapped.append(2 * d if 0 <= d <= theta else 2 * -d - 1 if -theta <= d < 0 else theta + abs(d))
    idb = 3 if n <= 8 else 4 if n <= 16 else 5
    out = Bits()
    for b in range(0, len(padded), J):
        first = 1 if b == 0 else 0  # the reference block carries J - 1 mapped values
        vals = mapped[b + first:b + J]
        best, option = idb + n * len(vals), None  # no compression
        for k in range(0, n - 1):
            cost = idb + sum((v >> k) + 1 for v in vals) + k * len(vals)
            if cost < best:
                best, option = cost, k
        out.put((1 << idb) - 1 if option is None else option + 1, idb)
        if first:
            out.put(padded[0], n)  # reference sample, n bits raw
        if option is None:
            for v in vals:
                out.put(v, n)
        else:
            for v in vals:
                out.fs(v >> option)
            for v in vals:
                out.put(v & ((1 << option) - 1), option)
    return out.octets()


def aec_check(stream, samples, n):
    if shutil.which('aec') is None:
        return 'aec not on the PATH: not cross-checked'
    with tempfile.TemporaryDirectory() as d:
        src, dst = os.path.join(d, 'q.rz'), os.path.join(d, 'q.raw')
        open(src, 'wb').write(stream)
        subprocess.run(['aec', '-d', '-n', str(n), '-j', '8', '-r', '32', '-m', '-3', src, dst], check=True)
        back = open(dst, 'rb').read()
    got = [int.from_bytes(back[3 * i:3 * i + 3], 'big') for i in range(len(back) // 3)]
    padded = samples + [samples[-1]] * (-len(samples) % 8)
    assert got[:len(padded)] == padded, (got, padded)
    return 'aec -d agrees'


def spectrum(apid, seq, coarse, fine, inst, w, mode, flag_octet, sweep, table, first, peak, periods, gains, sat,
             quads, compression):  # ICD 4 layout 2
    ud = struct.pack('>BHBBBHHHHHH', 0x82, inst, w, mode, flag_octet, sweep, table, first, len(gains), peak, periods)
    ud += tags(gains) + flags(sat) + bytes([compression])
    for q in quads:
        s = raw(q, w) if compression == 0 else rice(q, w)
        ud += struct.pack('>H', len(s)) + s
    return packet(apid, seq, cuc(coarse, fine) + ud)


# fine-cup (fine-cup.yaml: id 2, adc.bits 20, pedestal 1024, 2 ranges), survey, flags 0x40 table changed
c = 10
FQ1 = [1024 + 5000 * i for i in range(c)]
FQ1[4] = (1 << 20) - 1                       # at the 20-bit top: saturated (window index 4)
FQ2 = [1024 + 3 * i for i in range(c)]
FQ3 = [2000 + 77777 * i for i in range(c)]
FQ4 = [1000 + i for i in range(c)]           # below the pedestal: negative currents
FGAINS = [0, 0, 1, 1, 1, 1, 1, 0, 0, 0]
FSAT = [i == 4 for i in range(c)]
fine_args = (0x100, 3, T2026 + 20, 0x4000, 2, 20, 1, 0x40, 0x0042, 0, 100, 0x6A80, 16, FGAINS, FSAT,
             [FQ1, FQ2, FQ3, FQ4])
FINE_RAW = spectrum(*fine_args, 0)
FINE_RICE = spectrum(0x100, 4, T2026 + 30, 0x8000, *fine_args[4:], 1)
checks = [aec_check(rice(q, 20), q, 20) for q in fine_args[-1]]

# demo-cup in layout 2 (demo-cup.yaml: id 1, adc.bits 16, 3 ranges), focus, flags 0x80 stepped down
DQ = [[256 + 1000 * i for i in range(4)], [300, 301, 302, 303], [256, 256, 256, 256], [65535, 40000, 30000, 20000]]
demo_args = (0x101, 11, T2026 + 40, 0, 1, 16, 2, 0x80, 0x0100, 0, 60, 0xFFFF, 8, [0, 1, 2, 2],
             [False, False, False, True], DQ, 0)
DEMO_V2 = spectrum(*demo_args)
UNKNOWN_ID = spectrum(0x101, 9, T2026 + 41, 0, 7, 16, *demo_args[6:])     # instrument id 7: no description
WRONG_WIDTH = spectrum(0x101, 10, T2026 + 42, 0, 2, 16, *demo_args[6:])    # fine-cup's id with 16-bit samples

# a frame stream (ICD 1-2, L = 256, SCID 0x2C5, VC 0, FHP per frame, idle packet at the end)
L, DATA = 256, 248
body = UNKNOWN_ID + WRONG_WIDTH + FINE_RAW + DEMO_V2 + FINE_RICE
starts = []
at = 0
for p in (UNKNOWN_ID, WRONG_WIDTH, FINE_RAW, DEMO_V2, FINE_RICE):
    starts.append(at)
    at += len(p)
tail = -len(body) % DATA
if 0 < tail < 7:
    tail += DATA
body += packet(0x7FF, 0, b'\x55' * (tail - 6), sec_hdr=False) if tail else b''
starts.append(len(body) - tail)
frames = []
for f in range(len(body) // DATA):
    lo = f * DATA
    first = [s - lo for s in starts if lo <= s < lo + DATA]
    fhp = first[0] if first else 0x7FF
    w0 = (0x2C5 << 4) | (0 << 1)
    head = struct.pack('>HBBH', w0, f, f, (0b11 << 11) | fhp)
    fr = head + body[lo:lo + DATA]
    frames.append(fr + struct.pack('>H', binascii.crc_hqx(fr, 0xFFFF)))

for name, v in [('FINE_RAW', FINE_RAW), ('FINE_RICE', FINE_RICE), ('DEMO_V2', DEMO_V2), ('UNKNOWN_ID', UNKNOWN_ID),
                ('WRONG_WIDTH', WRONG_WIDTH)]:
    print(name, len(v), 'octets')
    print(v.hex())
print('CCSDS 121 quadrant streams:', ', '.join(checks), '; lengths', [len(rice(q, 20)) for q in fine_args[-1]])
for i, fr in enumerate(frames):
    assert len(fr) == L and binascii.crc_hqx(fr, 0xFFFF) == 0
    print('FRAME_%d' % i, 'FECF 0x%04X' % struct.unpack('>H', fr[-2:])[0])
    print(fr.hex())
