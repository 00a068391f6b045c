#!/usr/bin/env python3
"""Builds the golden TM frames of GoldenFrames.java by hand from the telemetry ICD (issue 3).

Independent of the Java code: struct packing per ICD sections 1-6, FECF from
binascii.crc_hqx(frame, 0xFFFF), which is CRC-16/CCITT-FALSE = CRC-16/IBM-3740 (standards.md).
Run: python3 make_golden_frames.py   (prints one hex string per frame, ASM not included)
"""
import binascii
import datetime
import struct

L = 128                      # frame length, octets (ICD 1: allowed 128..2048)
SCID = 0x2C5                 # ICD 1
DATA = L - 8                 # data field octets (ICD 1 diagram)


def frame(vcid, mc, vcc, fhp, data):
    assert len(data) == DATA
    w0 = (0 << 14) | (SCID << 4) | (vcid << 1) | 0          # TFVN 00, SCID, VCID, OCF flag 0
    w1 = (0 << 15) | (0 << 14) | (0 << 13) | (0b11 << 11) | fhp  # S=0 Y=0 O=0 SLI=11 FHP
    body = struct.pack('>HBBH', w0, mc, vcc, w1) + data
    return body + struct.pack('>H', binascii.crc_hqx(body, 0xFFFF))


def packet(apid, seq, data_field, sec_hdr=True):
    w0 = (0 << 13) | (0 << 12) | ((1 if sec_hdr else 0) << 11) | apid  # version 000, TM, sec hdr
    w1 = (0b11 << 14) | seq                                          # unsegmented
    return struct.pack('>HHH', w0, w1, len(data_field) - 1) + data_field


def cuc(coarse, fine):
    return struct.pack('>IH', coarse, fine)


def idle(seq, total):        # idle packet: no secondary header, user data 0x55 (ICD 3.3)
    return packet(0x7FF, seq, b'\x55' * (total - 6), sec_hdr=False)


T2026 = (datetime.date(2026, 1, 1) - datetime.date(1958, 1, 1)).days * 86400  # TAI seconds


def hk(seq, coarse):         # ICD 5
    ud = struct.pack('>BBIIHHHHHHI', 1, 1, 0x00012345, 0x00012340, 2, 3, 5, 0x0102, 0x0304, 1, 0x00ABCDEF)
    assert len(ud) == 26
    return packet(0x110, seq, cuc(coarse, 0x4000) + ud)


def spectrum():              # ICD 4, APID 0x100 survey, raw compression
    c, f = 16, 40
    gains = [0, 0, 0, 0, 0, 1, 1, 1, 2, 2, 1, 1, 0, 0, 0, 0]
    tags = bytes(sum(gains[4 * o + k] << (6 - 2 * k) for k in range(4)) for o in range(4))
    sat = bytes([0x00, 0x80])                                       # window 48 (index 8)
    q1 = [256 + 100 * i for i in range(c)]
    q1[8] = 65535
    q2 = [256 + 50 * i for i in range(c)]
    q3 = [300 + 7 * i for i in range(c)]
    q4 = [250 + i for i in range(c)]
    ud = struct.pack('>BBHHHHHH', 1, 0x80, 0x0123, 0, f, c, 0x2F80, 4) + tags + sat + b'\x00'
    for q in (q1, q2, q3, q4):
        ud += struct.pack('>H', 2 * c) + struct.pack('>%dH' % c, *q)
    return packet(0x100, 7, cuc(T2026 + 10, 0x8000) + ud)


out = {}
# GOLDEN_HK: VC 1, MC 5, VCC 3, FHP 0: housekeeping seq 42 + idle packet (seq 0) filling the tail
p = hk(42, T2026)
out['HOUSEKEEPING_WITH_IDLE_TAIL'] = frame(1, 0x05, 0x03, 0, p + idle(0, DATA - len(p)))
# spectrum of 169 octets over two VC 0 frames; idle packet (seq 1) fills the second frame's tail
s = spectrum()
assert len(s) == 169
out['SPECTRUM_PART_1'] = frame(0, 0x06, 0x10, 0, s[:DATA])
rest = s[DATA:]
out['SPECTRUM_PART_2'] = frame(0, 0x07, 0x11, len(rest), rest + idle(1, DATA - len(rest)))
# idle frame, VC 7
out['IDLE_FRAME'] = frame(7, 0x08, 0x00, 0x7FE, b'\x55' * DATA)
# three housekeeping packets (114 octets) leave a 6-octet tail: the idle packet (seq 2) starts there
# and fills the next VC 1 frame, whose FHP is 0x7FF (ICD 2)
hs = hk(43, T2026 + 4) + hk(44, T2026 + 8) + hk(45, T2026 + 12)
idl = idle(2, (DATA - len(hs)) + DATA)
out['THREE_HOUSEKEEPING_SPLIT_IDLE_1'] = frame(1, 0x09, 0x04, 0, hs + idl[:DATA - len(hs)])
out['THREE_HOUSEKEEPING_SPLIT_IDLE_2'] = frame(1, 0x0A, 0x05, 0x7FF, idl[DATA - len(hs):])

print('T2026 = 0x%08X' % T2026)
print('spectrum packet =', s.hex())
for k, v in out.items():
    assert len(v) == L and binascii.crc_hqx(v, 0xFFFF) == 0
    print(k, 'FECF 0x%04X' % struct.unpack('>H', v[-2:])[0])
    print(v.hex())
