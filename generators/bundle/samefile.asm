; SAMEFILE.COM - compares two files byte for byte and says so in ERRORLEVEL.
;   SAMEFILE first second
;   ERRORLEVEL 0 = same bytes, 1 = different, 2 = a name is missing or a file cannot be opened or read.
; Bootwright's installers use it because DOS before 6 has no file comparison that sets ERRORLEVEL
; and DOSBox has none at all. Handle calls only (INT 21h AH=3Dh open, 3Fh read, 3Eh close, 4Ch exit),
; all present since DOS 2.0. Assemble: nasm -f bin -o SAMEFILE.COM samefile.asm
; The bundle builder carries these bytes in samefile.ts; a test re-assembles this file and compares.

        cpu     8086
        org     100h

CHUNK   equ     512

start:
        mov     si, 81h                 ; command tail (PSP:80h holds its length, CR ends it)
        call    next_name
        jc      fail
        mov     [name1], dx
        call    next_name
        jc      fail
        mov     [name2], dx

        mov     dx, [name1]
        call    open_read
        jc      fail
        mov     [handle1], ax
        mov     dx, [name2]
        call    open_read
        jc      fail
        mov     [handle2], ax

compare_chunk:
        mov     bx, [handle1]
        mov     dx, buf1
        call    read_chunk
        jc      fail
        mov     bp, ax                  ; bytes read from the first file
        mov     bx, [handle2]
        mov     dx, buf2
        call    read_chunk
        jc      fail
        cmp     ax, bp
        jne     different               ; one file ended before the other
        or      ax, ax
        jz      same                    ; both ended together
        mov     cx, ax
        mov     si, buf1
        mov     di, buf2
        cld
        repe    cmpsb
        jne     different
        jmp     compare_chunk

same:
        mov     al, 0
        jmp     finish
different:
        mov     al, 1
        jmp     finish
fail:
        mov     al, 2
finish:
        push    ax
        mov     bx, [handle1]
        call    close_handle
        mov     bx, [handle2]
        call    close_handle
        pop     ax
        mov     ah, 4Ch
        int     21h

; Skips blanks at SI, then zero-terminates the word that follows. DX = start of the word, SI = just
; past it (on the zero when the word ended the tail, so the next call finds the end). Carry set when
; no word is left.
next_name:
        lodsb
        cmp     al, ' '
        je      next_name
        cmp     al, 9
        je      next_name
        cmp     al, 0Dh
        je      .none
        or      al, al
        jz      .none
        lea     dx, [si-1]
.scan:
        lodsb
        cmp     al, ' '
        je      .cut
        cmp     al, 9
        je      .cut
        cmp     al, 0Dh
        jne     .scan
        dec     si                      ; the CR ended the tail: stay on it
        mov     byte [si], 0
        clc
        ret
.cut:
        mov     byte [si-1], 0
        clc
        ret
.none:
        stc
        ret

open_read:                              ; DX = name; AX = handle, carry on error
        mov     ax, 3D00h
        int     21h
        ret

read_chunk:                             ; BX = handle, DX = buffer; AX = bytes read, carry on error
        mov     ah, 3Fh
        mov     cx, CHUNK
        int     21h
        ret

close_handle:                           ; BX = handle or 0 when never opened
        or      bx, bx
        jz      .skip
        mov     ah, 3Eh
        int     21h
.skip:
        ret

handle1 dw      0
handle2 dw      0
name1   dw      0
name2   dw      0

        section .bss
buf1    resb    CHUNK
buf2    resb    CHUNK
