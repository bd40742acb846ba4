; A stand-in program for boot tests: appends "NAME|command tail" and CR LF to C:\STUBLOG.TXT, then exits.
; Build one per program name:  nasm -f bin -DNAME='"MODE"' -o MODE.COM stub.asm
; With -DPICK it also exits with an error level read from C:\PICK.TXT, one digit per run (a stand-in for a
; menu prompt such as CHOICE, so menu loops in test files end). INT 21h calls as in the DOS programmer's
; references (3Ch create, 3Dh open, 3Eh close, 3Fh read, 40h write, 42h seek, 4Ch exit).
        org 100h

start:  mov dx, logname
        call append_open
        jc finish
        mov bx, ax
        mov ah, 40h
        mov cx, namelen
        mov dx, progname
        int 21h
        xor cx, cx
        mov cl, [80h]           ; command tail length (PSP offset 80h)
        mov dx, 81h
        mov ah, 40h
        int 21h
        mov ah, 40h
        mov cx, 2
        mov dx, crlf
        int 21h
        mov ah, 3Eh
        int 21h
%ifdef PICK
        call pick
%else
        xor al, al
%endif
finish: mov ah, 4Ch
        int 21h

; Opens (or creates) the file named at DS:DX for writing, positioned at its end. CF set on failure.
; Returns the handle in AX and, in CX, the file size before this run (low word).
append_open:
        push dx
        mov ax, 3D01h
        int 21h
        pop dx
        jnc .opened
        mov ah, 3Ch
        xor cx, cx
        int 21h
        jc .fail
.opened:
        push ax
        mov bx, ax
        mov ax, 4202h
        xor cx, cx
        xor dx, dx
        int 21h
        mov cx, ax
        pop ax
        clc
.fail:  ret

%ifdef PICK
; Counts runs in C:\PICK.CNT (one byte per run) and returns in AL the digit at that position of C:\PICK.TXT.
pick:   mov dx, cntname
        call append_open
        jc .none
        mov [count], cx
        mov bx, ax
        mov ah, 40h
        mov cx, 1
        mov dx, crlf
        int 21h
        mov ah, 3Eh
        int 21h
        mov ax, 3D00h
        mov dx, pickname
        int 21h
        jc .none
        mov bx, ax
        mov ax, 4200h
        xor cx, cx
        mov dx, [count]
        int 21h
        mov ah, 3Fh
        mov cx, 1
        mov dx, digit
        int 21h
        push ax
        mov ah, 3Eh
        int 21h
        pop ax
        cmp ax, 1
        jne .none
        mov al, [digit]
        sub al, '0'
        ret
.none:  mov al, 0FFh
        ret
cntname  db 'C:\PICK.CNT', 0
pickname db 'C:\PICK.TXT', 0
count    dw 0
digit    db 0
%endif

logname  db 'C:\STUBLOG.TXT', 0
crlf     db 13, 10
progname db NAME, '|'
namelen  equ $ - progname
