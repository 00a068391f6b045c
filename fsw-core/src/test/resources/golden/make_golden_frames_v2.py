#!/usr/bin/env python3
"""Builds the golden spectrum packets and frames of fsw-core's GoldenFrames.java by hand from the
telemetry ICD, layout version 2 (section 4: layout 0x82, instrument id, sample width w).

Independent of the Java code: struct packing per ICD sections 1-4, FECF from
binascii.crc_hqx(frame, 0xFFFF), which is CRC-16/CCITT-FALSE = CRC-16/IBM-3740 (standards.md).
The frames other than the spectrum's are those of ground-decoder's make_golden_frames.py (issue 3),
unchanged by layout 2. Run: python3 make_golden_frames_v2.py   (prints one hex string per item)
"""
import binascii
import datetime
import struct

L = 128                      # frame length, octets (ICD 1: allowed 128..2048)
SCID = 0x2C5                 # ICD 1
DATA = L - 8                 # data field octets (ICD 1 diagram)
LAYOUT_V2 = 0x82             # ICD 4: bit 7 set, version 2


def frame(vcid, mc, vcc, fhp, data):
    assert len(data) == DATA
    w0 = (0 << 14) | (SCID << 4) | (vcid << 1) | 0              # TFVN 00, SCID, VCID, OCF flag 0
    w1 = (0b11 << 11) | fhp                                      # S=0 Y=0 O=0 SLI=11 FHP
    body = struct.pack('>HBBH', w0, mc, vcc, w1) + data
    return body + struct.pack('>H', binascii.crc_hqx(body, 0xFFFF))


def packet(apid, seq, data_field, sec_hdr=True):
    w0 = ((1 if sec_hdr else 0) << 11) | apid                    # version 000, TM, sec hdr
    w1 = (0b11 << 14) | seq                                      # unsegmented
    return struct.pack('>HHH', w0, w1, len(data_field) - 1) + data_field


def cuc(coarse, fine):
    return struct.pack('>IH', coarse, fine)


def idle(seq, total):        # idle packet: no secondary header, user data 0x55 (ICD 3.3)
    return packet(0x7FF, seq, b'\x55' * (total - 6), sec_hdr=False)


T2026 = (datetime.date(2026, 1, 1) - datetime.date(1958, 1, 1)).days * 86400  # TAI seconds


def tags_and_flags(gains, saturated):
    c = len(gains)
    tags = bytes(sum((gains[4 * o + k] if 4 * o + k < c else 0) << (6 - 2 * k) for k in range(4))
                 for o in range((c + 3) // 4))
    sat = bytearray((c + 7) // 8)
    for i in saturated:
        sat[i // 8] |= 0x80 >> (i % 8)
    return tags + bytes(sat)


def header(instrument, width, mode, flags, sweep, table, first, count, peak, periods):
    # ICD 4 layout 2: version(1) instrument(2) w(1) mode(1) flags(1) sweep(2) table(2) f(2) c(2) peak(2) periods(2)
    return struct.pack('>BHBBBHHHHHH', LAYOUT_V2, instrument, width, mode, flags, sweep, table, first, count,
                       peak, periods)


def raw_quadrants(quadrants, width):
    octets = (width + 7) // 8                                   # ICD 4: ceil(w/8) octets a sample
    out = b''
    for q in quadrants:
        data = b''.join(v.to_bytes(octets, 'big') for v in q)
        out += struct.pack('>H', len(data)) + data
    return out


def demo_spectrum():         # the issue-3 golden spectrum (make_golden_frames.py) in layout 2: demo cup, id 1, w 16
    c, f = 16, 40
    gains = [0, 0, 0, 0, 0, 1, 1, 1, 2, 2, 1, 1, 0, 0, 0, 0]
    q1 = [256 + 100 * i for i in range(c)]
    q1[8] = 65535
    q2 = [256 + 50 * i for i in range(c)]
    q3 = [300 + 7 * i for i in range(c)]
    q4 = [250 + i for i in range(c)]
    ud = header(1, 16, 1, 0x80, 0x0123, 0, f, c, 0x2F80, 4) + tags_and_flags(gains, [8]) + b'\x00'
    ud += raw_quadrants((q1, q2, q3, q4), 16)
    return packet(0x100, 7, cuc(T2026 + 10, 0x8000) + ud)


def fine_spectrum():         # fine-cup (id 2, 20-bit ADC): focus sweep 9, windows 100..104 ascending, new table
    c, f = 5, 100
    gains = [0, 1, 1, 0, 0]
    q1 = [1024, 0x0FFFFF, 0x012345, 0x0ABCDE, 1024 + 5]
    q2 = [1024 + 1, 1024 + 2, 1024 + 3, 1024 + 4, 1024 + 5]
    q3 = [0, 1, 2, 3, 4]
    q4 = [0x0F0000, 0x0E0000, 0x0D0000, 0x0C0000, 0x0B0000]
    ud = header(2, 20, 2, 0x40, 9, 0xBEEF, f, c, 0xFFFF, 16) + tags_and_flags(gains, [1]) + b'\x00'
    ud += raw_quadrants((q1, q2, q3, q4), 20)
    return packet(0x101, 3, cuc(T2026 + 20, 0x4000) + ud)


out = {}
s = demo_spectrum()
assert len(s) == 173                                            # 169 of layout 1 + 4 octets
out['SPECTRUM_PART_1'] = frame(0, 0x06, 0x10, 0, s[:DATA])
rest = s[DATA:]
out['SPECTRUM_PART_2'] = frame(0, 0x07, 0x11, len(rest), rest + idle(1, DATA - len(rest)))

print('spectrum packet =', s.hex())
print('fine spectrum packet =', fine_spectrum().hex())
for k, v in out.items():
    assert len(v) == L and binascii.crc_hqx(v, 0xFFFF) == 0
    print(k, 'FECF 0x%04X' % struct.unpack('>H', v[-2:])[0])
    print(v.hex())
